import { Entity, Enum, Property, Unique, type Opt } from '@mikro-orm/core';
import { INSTRUMENT_KINDS, type InstrumentKind } from '@gaugeproof/api-types';
import { TimestampedEntity, InheritedColumns } from '../../common/base-entities';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { INSTRUMENT_KINDS, type InstrumentKind };

/** A registered measuring instrument with its calibration status (ISO 9001 7.1.5). */
@Entity({ tableName: 'instruments' })
@InheritedColumns({ before: 'accuracyPercentOfReading' })
export class Instrument extends TimestampedEntity {
  @Enum({ items: () => INSTRUMENT_KINDS, type: 'string' })
  kind!: InstrumentKind;

  @Property({ type: 'string', length: 120 })
  name!: string;

  @Property({ type: 'string', length: 64 })
  @Unique()
  serial!: string;

  /** Smallest step the instrument shows, in `resolutionUnit`. */
  @Property({ type: 'double' })
  resolution!: number;

  /** g, mm, ohm, degC */
  @Property({ type: 'string', length: 8 })
  resolutionUnit!: string;

  /** Calendar dates as YYYY-MM-DD. */
  @Property({ type: 'string', length: 10 })
  calibratedOn!: string;

  @Property({ type: 'string', length: 10 })
  calibrationDueOn!: string;

  @Property({ type: 'boolean' })
  active: Opt<boolean> = true;

  /** Stated accuracy as ± % of the reading (maker's specification); null when not stated. */
  @Property({ type: 'double', nullable: true })
  accuracyPercentOfReading: number | null = null;

  /** Stated accuracy as a fixed ± amount, in `resolutionUnit`; null when not stated. */
  @Property({ type: 'double', nullable: true })
  accuracyAbsolute: number | null = null;

  /** Expanded uncertainty (k = 2) from the calibration certificate, in `resolutionUnit`. */
  @Property({ type: 'double', nullable: true })
  calibrationUncertainty: number | null = null;

  /** Optimistic lock: an edit made on a stale copy is refused with 409 (issue 17 item 7). */
  @Property({ type: 'integer', version: true })
  version!: Opt<number>;
}
