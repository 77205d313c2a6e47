import {
  UNITS_BY_KIND,
  INSTRUMENT_KINDS,
  RESOLUTION_UNITS,
  type CalibrationStatus,
  type InstrumentKind,
  type ResolutionUnit,
} from '@gaugeproof/api-types';
// The enums are the contract's (libs/api-types).
export {
  INSTRUMENT_KINDS,
  RESOLUTION_UNITS,
  type CalibrationStatus,
  type InstrumentKind,
  type ResolutionUnit,
};

export interface Instrument {
  id: number;
  kind: InstrumentKind;
  name: string;
  serial: string;
  resolution: number;
  resolutionUnit: ResolutionUnit;
  calibratedOn: string;
  calibrationDueOn: string;
  active: boolean;
  calibrationStatus: CalibrationStatus;
  daysToDue: number;
  /** Stated accuracy ± % of reading, ± an amount in resolutionUnit, certificate U (k = 2). */
  accuracyPercentOfReading: number | null;
  accuracyAbsolute: number | null;
  calibrationUncertainty: number | null;
  /** Moves on every save; an edit sends the one it was made on (a stale one: 409). */
  version: number;
}

export { instrumentKindLabels as kindLabels } from '@/lib/labels';

export const unitLabels: Record<ResolutionUnit, string> = {
  g: 'g',
  mm: 'mm',
  ohm: 'Ω',
  mohm: 'mΩ',
  degC: '°C',
};

/** What each kind of instrument reads in: the contract's rule, as the server checks it. */
export { UNITS_BY_KIND };
