import { daysBetween, isCalendarDate, isoDate } from '../common/calendar';
import type { Instrument, InstrumentKind } from './entities/instrument.entity';
import { RESOLUTION_UNITS, UNITS_BY_KIND, type ResolutionUnit } from '@gaugeproof/api-types';
import { clock } from '../common/clock';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { RESOLUTION_UNITS, UNITS_BY_KIND, type ResolutionUnit };

/** "Due soon" means due within 14 days (docs/api-conventions.md; common practice, no source). */
export const DUE_SOON_DAYS = 14;

export const KIND_NAMES: Record<InstrumentKind, string> = {
  balance: 'Balance',
  micrometer: 'Micrometer',
  caliper: 'Caliper',
  length_rule: 'Length rule',
  milliohm_meter: 'Milliohm meter',
  thermometer: 'Thermometer',
};

export type CalibrationStatus = 'ok' | 'due_soon' | 'overdue';

/** Overdue once the due date has passed; an instrument is still usable on its due date. */
export function calibrationStatus(dueOn: string, today: string): CalibrationStatus {
  const days = daysBetween(today, dueOn);
  if (days < 0) return 'overdue';
  return days <= DUE_SOON_DAYS ? 'due_soon' : 'ok';
}

/** Which instrument it is and how finely it reads: in its view and in a reading's snapshot. */
export function instrumentIdentity(
  i: Pick<Instrument, 'id' | 'kind' | 'name' | 'serial' | 'resolution' | 'resolutionUnit'>,
) {
  return {
    id: i.id,
    kind: i.kind,
    name: i.name,
    serial: i.serial,
    resolution: i.resolution,
    resolutionUnit: i.resolutionUnit,
  };
}

/** The maker's accuracy and the calibration's uncertainty, null where not given. */
export function instrumentAccuracy(
  i: Partial<
    Pick<Instrument, 'accuracyPercentOfReading' | 'accuracyAbsolute' | 'calibrationUncertainty'>
  >,
) {
  return {
    accuracyPercentOfReading: i.accuracyPercentOfReading ?? null,
    accuracyAbsolute: i.accuracyAbsolute ?? null,
    calibrationUncertainty: i.calibrationUncertainty ?? null,
  };
}

export function instrumentView(i: Instrument, now = clock.now()) {
  const today = isoDate(now);
  return {
    ...instrumentIdentity(i),
    ...instrumentAccuracy(i),
    calibratedOn: i.calibratedOn,
    calibrationDueOn: i.calibrationDueOn,
    active: i.active,
    calibrationStatus: calibrationStatus(i.calibrationDueOn, today),
    daysToDue: daysBetween(today, i.calibrationDueOn),
    version: i.version,
    createdAt: i.createdAt,
    updatedAt: i.updatedAt,
  };
}
export type InstrumentView = ReturnType<typeof instrumentView>;

/** Field messages for an instrument as a whole (after a create or a patch), [] when fine. */
export function instrumentProblems(i: {
  kind: InstrumentKind;
  resolutionUnit: string;
  calibratedOn: string;
  calibrationDueOn: string;
}): string[] {
  const problems: string[] = [];
  const units = UNITS_BY_KIND[i.kind];
  if (!(units as readonly string[]).includes(i.resolutionUnit)) {
    problems.push(
      `resolutionUnit of a ${KIND_NAMES[i.kind].toLowerCase()} must be ${units.join(' or ')}`,
    );
  }
  if (!isCalendarDate(i.calibratedOn)) problems.push('calibratedOn is not a real date');
  if (!isCalendarDate(i.calibrationDueOn)) {
    problems.push('calibrationDueOn is not a real date');
  } else if (i.calibrationDueOn <= i.calibratedOn) {
    problems.push('calibrationDueOn must be after calibratedOn');
  }
  return problems;
}
