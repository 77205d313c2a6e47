import { Entity, Enum, ManyToOne, Property, type Opt } from '@mikro-orm/core';
import { IdEntity } from '../../common/base-entities';
import { Product } from './product.entity';
import {
  CONDUCTOR_PURPOSES,
  CLAIMED_MATERIALS,
  type ConductorPurpose,
  type ClaimedMaterial,
} from '@gaugeproof/api-types';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { CONDUCTOR_PURPOSES, CLAIMED_MATERIALS, type ConductorPurpose, type ClaimedMaterial };

@Entity({ tableName: 'conductor_specs' })
export class ConductorSpec extends IdEntity {
  @ManyToOne(() => Product)
  product!: Product;

  /** Order within the product (a kit lists power first). */
  @Property({ type: 'integer' })
  position: Opt<number> = 0;

  @Enum({ items: () => CONDUCTOR_PURPOSES, type: 'string' })
  purpose!: ConductorPurpose;

  /** Canonical label from parseGauge ("4 AWG", "1/0 AWG", "25 mm²"). */
  @Property({ type: 'string', length: 32 })
  gaugeLabel!: string;

  @Property({ type: 'string', length: 8 })
  gaugeSystem!: 'awg' | 'metric';

  @Property({ type: 'double' })
  nominalAreaMm2!: number;

  @Enum({ items: () => CLAIMED_MATERIALS, type: 'string' })
  claimedMaterial!: ClaimedMaterial;

  @Property({ type: 'integer', nullable: true })
  claimedStrands: number | null = null;

  /** Kept so that a changed product never rewrites the history of old lots. */
  @Property({ type: 'boolean' })
  active: Opt<boolean> = true;

  /** IEC 60228 class (1, 2, 5, 6) of a metric conductor; null for AWG. */
  @Property({ type: 'integer', nullable: true })
  conductorClass: number | null = null;
}
