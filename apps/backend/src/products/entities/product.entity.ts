import {
  Collection,
  Entity,
  Enum,
  ManyToOne,
  OneToMany,
  Property,
  Unique,
  type Opt,
} from '@mikro-orm/core';
import { Supplier } from '../../suppliers/entities/supplier.entity';
import { ConductorSpec } from './conductor-spec.entity';
import { PRODUCT_KINDS, type ProductKind } from '@gaugeproof/api-types';
import { TimestampedEntity, InheritedColumns } from '../../common/base-entities';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { PRODUCT_KINDS, type ProductKind };

@Entity({ tableName: 'products' })
@Unique({ properties: ['supplier', 'sku'] })
@InheritedColumns({ before: 'concessionNeedsApproval' })
export class Product extends TimestampedEntity {
  @ManyToOne(() => Supplier)
  supplier!: Supplier;

  @Property({ type: 'string', length: 64 })
  sku!: string;

  @Enum({ items: () => PRODUCT_KINDS, type: 'string' })
  kind!: ProductKind;

  @Property({ type: 'string', length: 300 })
  description!: string;

  /** Length of cable in one unit (a spool, or the power run of a kit), metres. */
  @Property({ type: 'double', nullable: true })
  lengthPerUnitM: number | null = null;

  /** ISO 2859-1 inspection level; S-3 by default because samples are destroyed. */
  @Property({ type: 'string', length: 8 })
  inspectionLevel: Opt<string> = 'S-3';

  /** AQL in percent nonconforming, written as in the tables ("1.0"). */
  @Property({ type: 'string', length: 8 })
  aql: Opt<string> = '1.0';

  /** Area acceptance: at least 98 % of nominal by default (ASTM B496). */
  @Property({ type: 'double' })
  minAreaRatio: Opt<number> = 0.98;

  @Property({ type: 'boolean' })
  active: Opt<boolean> = true;

  @OneToMany(() => ConductorSpec, (c) => c.product, { orphanRemoval: false })
  conductors = new Collection<ConductorSpec>(this);

  // Last, as the migration adds it (SQLite compares column order).
  /**
   * Accepting a lot on concession against a reject recommendation needs a second QA lead's
   * or an admin's approval (issue 14 §7; on by default).
   */
  @Property({ type: 'boolean', default: true })
  concessionNeedsApproval: Opt<boolean> = true;

  /** Optimistic lock: an edit made on a stale copy is refused with 409 (issue 17 item 7). */
  @Property({ type: 'integer', version: true })
  version!: Opt<number>;
}
