import { Entity, ManyToOne, Property, Unique, type Opt } from '@mikro-orm/core';
import { Lot } from '../../lots/entities/lot.entity';
import { Decision } from './decision.entity';
import { NCR_STATUSES } from '@gaugeproof/api-types';
import { CreatedEntity } from '../../common/base-entities';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { NCR_STATUSES };

/** Nonconformance report opened by a reject, numbered NCR-YYYY-NNNN. */
@Entity({ tableName: 'nonconformances' })
@Unique({ properties: ['year', 'seq'] })
export class Nonconformance extends CreatedEntity {
  @Property({ type: 'string', length: 20 })
  @Unique()
  number!: string;

  @Property({ type: 'integer' })
  year!: number;

  @Property({ type: 'integer' })
  seq!: number;

  @ManyToOne(() => Lot)
  lot!: Lot;

  @ManyToOne(() => Decision)
  decision!: Decision;

  /** Material review disposition once decided: return_to_vendor, use_as_is, rework, scrap. */
  @Property({ type: 'string', length: 24, nullable: true })
  disposition: string | null = null;

  @Property({ type: 'string', length: 8 })
  status: Opt<string> = 'open';
}
