import type { ResolutionUnit } from '@gaugeproof/api-types';
// The enums and the shape are the contract's (libs/api-types).
export {
  INSTRUMENT_KINDS,
  RESOLUTION_UNITS,
  type CalibrationStatus,
  type InstrumentKind,
  type ResolutionUnit,
} from '@gaugeproof/api-types';

export type { Instrument } from '@gaugeproof/api-types';

export { instrumentKindLabels as kindLabels } from '@/lib/labels';

export const unitLabels: Record<ResolutionUnit, string> = {
  g: 'g',
  mm: 'mm',
  ohm: 'Ω',
  mohm: 'mΩ',
  degC: '°C',
};

/** What each kind of instrument reads in: the contract's rule, as the server checks it. */
export { UNITS_BY_KIND } from '@gaugeproof/api-types';
