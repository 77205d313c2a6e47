import type { EntityManager } from '@mikro-orm/core';
import { isoDate } from '../common/calendar';
import { registerInstrument, type DemoInstrument } from './seed-catalog';
import { Instrument, type InstrumentKind } from '../instruments/entities/instrument.entity';
import type { ReadingMethod } from '../inspection/entities/reading.entity';

/**
 * The second set of bench instruments, on an older calibration cycle than the catalog's, so
 * the readings of the early months were taken with an instrument in calibration on the day.
 */
const OLDER_CYCLE: DemoInstrument[] = [
  {
    kind: 'balance',
    name: 'Bench balance B-2',
    serial: 'GP-B-02',
    resolution: 0.01,
    resolutionUnit: 'g',
    accuracyAbsolute: 0.03,
    calibrationUncertainty: 0.01,
    cal: { sinceDays: -300, dueInDays: 65 },
  },
  {
    kind: 'milliohm_meter',
    name: 'Four-wire milliohm meter (spare)',
    serial: 'GP-O-02',
    resolution: 0.001,
    resolutionUnit: 'mohm',
    accuracyPercentOfReading: 0.25,
    accuracyAbsolute: 0.002,
    calibrationUncertainty: 0.001,
    cal: { sinceDays: -280, dueInDays: 85 },
  },
  {
    kind: 'thermometer',
    name: 'Probe thermometer (spare)',
    serial: 'GP-T-02',
    resolution: 0.1,
    resolutionUnit: 'degC',
    accuracyAbsolute: 0.5,
    calibrationUncertainty: 0.2,
    cal: { sinceDays: -290, dueInDays: 75 },
  },
];

/** Kinds a method uses, in the order named on the reading (the first one is required). */
const KINDS: Record<ReadingMethod, InstrumentKind[]> = {
  mass: ['balance', 'length_rule'],
  resistance: ['milliohm_meter', 'length_rule', 'thermometer'],
  // A caliper's 0.01 mm is too coarse for a 0.3 mm strand; strands are read with the micrometer.
  strands: ['micrometer'],
  diameter: ['micrometer'],
};

export class InstrumentBench {
  private constructor(private readonly all: Instrument[]) {}

  static async open(em: EntityManager, now: Date): Promise<InstrumentBench> {
    const today = isoDate(now);
    for (const i of OLDER_CYCLE) registerInstrument(em, i, today);
    await em.flush();
    return new InstrumentBench(await em.find(Instrument, { active: true }));
  }

  /** Whether a method can be read on that day with an instrument in calibration. */
  covers(method: ReadingMethod, at: Date): boolean {
    return KINDS[method].every((k) => this.inCalibration(k, isoDate(at)) !== undefined);
  }

  /**
   * The instruments for a method on a day: of each kind, the most recently calibrated one
   * whose calibration period covers the day. Never one past its due date.
   */
  for(method: ReadingMethod, at: Date): Instrument[] {
    const day = isoDate(at);
    return KINDS[method].map((kind) => {
      const found = this.inCalibration(kind, day);
      if (!found) throw new Error(`demo seed: no ${kind} in calibration on ${day}`);
      return found;
    });
  }

  private inCalibration(kind: InstrumentKind, day: string): Instrument | undefined {
    return this.all
      .filter((i) => i.kind === kind && i.calibratedOn <= day && day <= i.calibrationDueOn)
      .sort((a, b) => b.calibratedOn.localeCompare(a.calibratedOn))[0];
  }
}
