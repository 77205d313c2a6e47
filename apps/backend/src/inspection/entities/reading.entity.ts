import { Entity, Enum, Index, ManyToOne, Property, type Opt } from '@mikro-orm/core';
import { clock } from '../../common/clock';
import { User } from '../../users/entities/user.entity';
import { Sample } from './sample.entity';
import { READING_METHODS, VERDICTS, type ReadingMethod, type Verdict } from '@gaugeproof/api-types';
import { InheritedColumns } from '../../common/base-entities';
import { VoidableEntity } from '../../users/entities/voidable-entity';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { READING_METHODS, VERDICTS, type ReadingMethod, type Verdict };

/** What an instrument was when the reading was taken, kept as evidence. */
export interface InstrumentSnapshot {
  id: number;
  kind: string;
  name: string;
  serial: string;
  resolution: number;
  resolutionUnit: string;
  calibrationDueOn: string;
  /** The register's stated accuracy and certificate U (k = 2) when the reading was taken. */
  accuracyPercentOfReading?: number | null;
  accuracyAbsolute?: number | null;
  calibrationUncertainty?: number | null;
}

/** A raw input: one number, or several (strand diameters, 1 to 10). */
export type ReadingInputValue = number | number[];

/**
 * One measurement on a sample. Never deleted: a wrong one is voided with a reason (VoidableEntity).
 * The flat result columns feed lists and scorecards; `result` keeps the whole computation.
 */
@Entity({ tableName: 'readings' })
/**
 * Covers every scorecard aggregate over readings (sample, voided, verdict, mismatch, ratio,
 * measured size) so they read the index, never the wide rows with their `result` JSON; its
 * (sample, voided) prefix serves the per-sample lookups the old two-column index served.
 */
@Index({
  name: 'readings_scorecard_covering_index',
  properties: ['sample', 'voided', 'verdict', 'materialMismatch', 'areaRatio', 'measuresAs'],
})
@InheritedColumns({ before: 'fourWire' })
export class Reading extends VoidableEntity {
  @ManyToOne(() => Sample)
  sample!: Sample;

  @Enum({ items: () => READING_METHODS, type: 'string' })
  method!: ReadingMethod;

  /** The raw inputs as entered (massG, lengthMm, …). */
  @Property({ type: 'json' })
  inputs!: Record<string, ReadingInputValue>;

  @Property({ type: 'json' })
  instruments: Opt<InstrumentSnapshot[]> = [];

  @Property({ type: 'double' })
  areaMm2!: number;

  /** Standard uncertainty of the area. */
  @Property({ type: 'double' })
  uMm2!: number;

  /** Expanded uncertainty, k = 2. */
  @Property({ type: 'double' })
  expandedUMm2!: number;

  @Property({ type: 'double' })
  areaRatio!: number;

  @Property({ type: 'string', length: 32 })
  measuresAs!: string;

  /** copper | cca | aluminium | inconsistent | unknown, when the readings allow it. */
  @Property({ type: 'string', length: 16, nullable: true })
  identifiedMaterial: string | null = null;

  /** Sold as copper, found CCA or aluminium. */
  @Property({ type: 'boolean' })
  materialMismatch: Opt<boolean> = false;

  @Enum({ items: () => VERDICTS, type: 'string' })
  verdict!: Verdict;

  /** Full computation: budget, reasons, material identification, length for a conclusive result. */
  @Property({ type: 'json' })
  result!: Record<string, unknown>;

  @ManyToOne(() => User)
  takenBy!: User;

  @Property({ type: 'Date' })
  takenAt: Opt<Date> = clock.now();

  /** Resistance readings: four-wire (Kelvin) or not; null for the other methods. */
  @Property({ type: 'boolean', nullable: true })
  fourWire: boolean | null = null;

  /** The clerk confirmed a reading the plausibility checks questioned (issue 13). */
  @Property({ type: 'boolean' })
  confirmedUnusual: Opt<boolean> = false;
}
