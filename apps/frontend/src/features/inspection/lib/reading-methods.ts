import type { InstrumentKind, ReadingMethod } from '@/features/inspection/types';

export interface InputField {
  /** Name in the request body (docs/api-conventions.md Reading inputs). */
  name:
    | 'massG'
    | 'lengthMm'
    | 'count'
    | 'strandDiameterMm'
    | 'resistanceOhm'
    | 'temperatureC'
    | 'diameterMm';
  label: string;
  /** Unit the clerk types in; resistance is typed in mΩ as milliohm meters show it. */
  unit: string;
  integer?: boolean;
  /** Several values, separated by spaces or ; (strand diameters: 1 to 10). */
  list?: boolean;
  /** Temperatures may be zero or below; everything else must be positive. */
  allowNonPositive?: boolean;
  helper?: string;
}

export type ResolutionSlot =
  | 'massResolutionG'
  | 'lengthResolutionMm'
  | 'diameterResolutionMm'
  | 'resistanceResolutionOhm'
  | 'temperatureResolutionC';

export interface InstrumentSlot {
  slot: ResolutionSlot;
  label: string;
  kinds: readonly InstrumentKind[];
  required: boolean;
}

export interface MethodDefinition {
  method: ReadingMethod;
  label: string;
  hint: string;
  fields: readonly InputField[];
  instruments: readonly InstrumentSlot[];
}

const lengthRule: InstrumentSlot = {
  slot: 'lengthResolutionMm',
  label: 'Length rule',
  kinds: ['length_rule'],
  required: false,
};
const gauge: InstrumentSlot = {
  slot: 'diameterResolutionMm',
  label: 'Micrometer or caliper',
  kinds: ['micrometer', 'caliper'],
  required: true,
};

export const METHODS: Readonly<Record<ReadingMethod, MethodDefinition>> = {
  mass: {
    method: 'mass',
    label: 'Mass',
    hint: 'Strip the whole sample, weigh all its strands, and give the cut length (ASTM B263).',
    fields: [
      { name: 'massG', label: 'Mass of the strands', unit: 'g' },
      {
        name: 'lengthMm',
        label: 'Cut length',
        unit: 'mm',
        helper: 'A 1 m sample is common practice.',
      },
    ],
    instruments: [
      { slot: 'massResolutionG', label: 'Balance', kinds: ['balance'], required: true },
      lengthRule,
    ],
  },
  strands: {
    method: 'strands',
    label: 'Strands',
    hint: 'Count the strands and measure three or more strands with a micrometer (up to 10).',
    fields: [
      { name: 'count', label: 'Strand count', unit: 'strands', integer: true },
      {
        name: 'strandDiameterMm',
        label: 'Strand diameters',
        unit: 'mm',
        list: true,
        helper:
          'One per strand, separated by spaces: 0.253 0.254 0.255. Three or more recommended.',
      },
    ],
    instruments: [gauge],
  },
  resistance: {
    method: 'resistance',
    label: 'Resistance',
    hint: 'Four-wire DC resistance between the voltage contacts, with the conductor temperature.',
    fields: [
      {
        name: 'resistanceOhm',
        label: 'Resistance in mΩ',
        unit: 'mΩ',
        helper: 'In milliohms, as the meter shows it (0.805 mΩ, not 0.000805).',
      },
      { name: 'lengthMm', label: 'Length between contacts', unit: 'mm' },
      { name: 'temperatureC', label: 'Conductor temperature', unit: '°C', allowNonPositive: true },
    ],
    instruments: [
      {
        slot: 'resistanceResolutionOhm',
        label: 'Milliohm meter',
        kinds: ['milliohm_meter'],
        required: true,
      },
      lengthRule,
      {
        slot: 'temperatureResolutionC',
        label: 'Thermometer',
        kinds: ['thermometer'],
        required: false,
      },
    ],
  },
  diameter: {
    method: 'diameter',
    label: 'Diameter',
    hint: 'Diameter of a solid conductor, measured with a micrometer. Not for stranded conductors: weigh them or measure their strands.',
    fields: [{ name: 'diameterMm', label: 'Conductor diameter', unit: 'mm' }],
    instruments: [gauge],
  },
};

export const METHOD_ORDER: readonly ReadingMethod[] = ['mass', 'strands', 'resistance', 'diameter'];
