import type { DecisionOutcome } from '../decisions/entities/decision.entity';
import type { ConductorPurpose } from '../products/entities/conductor-spec.entity';

/** Units of a lot whose conductor is not what the label says, in the invented story. */
export interface Fault {
  units: number[];
  /** The size the conductor really has (default: its label). */
  realGauge?: string;
  /** Multiplies the real size's area (e.g. 0.975: 2.5 % short). */
  ratio?: number;
  /** Copper-clad aluminium sold as copper. */
  cca?: boolean;
}

export interface LotStory {
  key: string;
  product: string;
  daysAgo: number;
  quantity: number;
  unit: 'spools' | 'kits' | 'drums';
  faults?: Partial<Record<ConductorPurpose, Fault>>;
  /** Units measured; default every planned unit. 0 leaves the lot on hold. */
  measured?: number;
  /** Four-wire resistance on unit 1 only (default) or on every unit. */
  resistance?: 'first' | 'all';
  /** Strand count and diameter on unit 1 (micrometer: recent lots only). */
  strands?: boolean;
  /** A mistyped mass reading on unit 2, voided by the QA lead with this reason. */
  voided?: string;
  /** Default: the recommendation, once every planned unit is measured and not `today`. */
  decision?: { outcome: DecisionOutcome; reason: string } | 'none';
  /** The terms of an accept-on-concession decision (approved by the admin in the story). */
  concession?: { scope: string; quantity: number; days: number };
  photo?: 'copper' | 'cca' | 'undersized';
}

/**
 * The invented history, about eight months back to today. Harborline: good, every lot
 * accepted. Tessaro: good, metric drums, one taken on concession. Veltro: drifting, its
 * "4 AWG" kit power lead measures as 6 AWG in some lots (tightened inspection) and an 8 AWG
 * spool came in a size short. Quickamp: bad, a "copper" 4 AWG spool that is copper-clad
 * aluminium in two lots (rejected, returned, two SCARs), and a kit whose ground is short.
 */
export const STORY: LotStory[] = [
  { key: 'hl4-1', product: 'spool4', daysAgo: 236, quantity: 8, unit: 'spools' },
  { key: 'vw8-1', product: 'spool8', daysAgo: 232, quantity: 10, unit: 'spools' },
  { key: 'ts25-1', product: 'spool25', daysAgo: 229, quantity: 4, unit: 'drums' },
  { key: 'vwk-1', product: 'kit4', daysAgo: 225, quantity: 16, unit: 'kits' },
  { key: 'hl10-1', product: 'spool1_0', daysAgo: 222, quantity: 5, unit: 'spools' },
  { key: 'qa4-1', product: 'qaSpool4', daysAgo: 214, quantity: 6, unit: 'spools' },
  { key: 'hl4-2', product: 'spool4', daysAgo: 208, quantity: 6, unit: 'spools' },
  { key: 'qak-1', product: 'kitShortGround', daysAgo: 198, quantity: 16, unit: 'kits' },
  { key: 'vw8-2', product: 'spool8', daysAgo: 190, quantity: 8, unit: 'spools' },
  { key: 'ts25-2', product: 'spool25', daysAgo: 187, quantity: 5, unit: 'drums' },
  { key: 'vwk-2', product: 'kit4', daysAgo: 183, quantity: 16, unit: 'kits' },
  { key: 'hl4-3', product: 'spool4', daysAgo: 181, quantity: 10, unit: 'spools' },
  { key: 'qa4-2', product: 'qaSpool4', daysAgo: 172, quantity: 6, unit: 'spools' },
  { key: 'hl10-2', product: 'spool1_0', daysAgo: 166, quantity: 4, unit: 'spools' },
  { key: 'hl4-4', product: 'spool4', daysAgo: 153, quantity: 8, unit: 'spools' },
  { key: 'vw8-3', product: 'spool8', daysAgo: 148, quantity: 10, unit: 'spools' },
  { key: 'ts25-3', product: 'spool25', daysAgo: 145, quantity: 4, unit: 'drums' },
  {
    key: 'vwk-3',
    product: 'kit4',
    daysAgo: 141,
    quantity: 16,
    unit: 'kits',
    faults: { power: { units: [5], realGauge: '6 AWG' } },
  },
  {
    key: 'qa4-cca-1',
    product: 'qaSpool4',
    daysAgo: 134,
    quantity: 6,
    unit: 'spools',
    faults: { power: { units: [1, 2, 3, 4, 5, 6], cca: true } },
    resistance: 'all',
    photo: 'cca',
  },
  { key: 'hl4-5', product: 'spool4', daysAgo: 126, quantity: 6, unit: 'spools' },
  {
    key: 'qak-2',
    product: 'kitShortGround',
    daysAgo: 120,
    quantity: 16,
    unit: 'kits',
    faults: { ground: { units: [5], realGauge: '10 AWG' } },
  },
  { key: 'hl10-3', product: 'spool1_0', daysAgo: 110, quantity: 6, unit: 'spools' },
  {
    key: 'vw8-4',
    product: 'spool8',
    daysAgo: 106,
    quantity: 8,
    unit: 'spools',
    voided: 'Cut length typed as 52 mm; the piece measures 520 mm on the rule. Re-entered.',
  },
  {
    key: 'ts25-4',
    product: 'spool25',
    daysAgo: 103,
    quantity: 5,
    unit: 'drums',
    faults: { power: { units: [3], ratio: 0.975 } },
    decision: {
      outcome: 'accept_on_concession',
      reason:
        'Drum 3 is 2.5 % short of 25 mm²; engineering reviewed it for the short battery straps of the fleet job and the supplier was told. Drum kept apart and labelled.',
    },
    concession: {
      scope: 'Battery straps of 0.5 m or less on the fleet job only',
      quantity: 1,
      days: 180,
    },
  },
  { key: 'vwk-4', product: 'kit4', daysAgo: 99, quantity: 16, unit: 'kits' },
  { key: 'hl4-6', product: 'spool4', daysAgo: 98, quantity: 8, unit: 'spools' },
  { key: 'qa4-3', product: 'qaSpool4', daysAgo: 92, quantity: 6, unit: 'spools' },
  {
    key: 'vwk-5',
    product: 'kit4',
    daysAgo: 78,
    quantity: 16,
    unit: 'kits',
    faults: {
      power: { units: [2, 7], realGauge: '6 AWG' },
      remote: { units: [3], realGauge: '20 AWG' },
    },
  },
  { key: 'hl4-7', product: 'spool4', daysAgo: 71, quantity: 10, unit: 'spools' },
  {
    key: 'vw8-5',
    product: 'spool8',
    daysAgo: 64,
    quantity: 10,
    unit: 'spools',
    faults: { power: { units: [4], realGauge: '10 AWG' } },
  },
  { key: 'ts25-5', product: 'spool25', daysAgo: 61, quantity: 6, unit: 'drums' },
  { key: 'hl10-4', product: 'spool1_0', daysAgo: 57, quantity: 5, unit: 'spools', strands: true },
  {
    key: 'qa4-cca-2',
    product: 'qaSpool4',
    daysAgo: 50,
    quantity: 6,
    unit: 'spools',
    faults: { power: { units: [1, 2, 3, 4, 5, 6], cca: true } },
    resistance: 'all',
    strands: true,
    photo: 'cca',
  },
  { key: 'hl4-8', product: 'spool4', daysAgo: 43, quantity: 6, unit: 'spools', strands: true },
  { key: 'vwk-6', product: 'kit4', daysAgo: 36, quantity: 16, unit: 'kits' },
  {
    key: 'qak-3',
    product: 'kitShortGround',
    daysAgo: 27,
    quantity: 16,
    unit: 'kits',
    faults: { ground: { units: [3, 8], realGauge: '10 AWG' } },
  },
  {
    key: 'vw8-6',
    product: 'spool8',
    daysAgo: 22,
    quantity: 8,
    unit: 'spools',
    faults: { power: { units: [2], ratio: 0.965 } },
    decision: {
      outcome: 'accept_on_concession',
      reason:
        'Spool 2 is 3.5 % short of 8 AWG; the rest conform. Taken for the low-current lighting looms only, after engineering review; supplier told.',
    },
    concession: {
      scope: 'Low-current lighting looms only; not for power or fused runs',
      quantity: 1,
      days: 120,
    },
  },
  { key: 'ts25-6', product: 'spool25', daysAgo: 19, quantity: 4, unit: 'drums', strands: true },
  { key: 'hl4-9', product: 'spool4', daysAgo: 16, quantity: 8, unit: 'spools', photo: 'copper' },
  // Today's work: one awaiting a reject, one awaiting an accept, one half measured, one held.
  {
    key: 'vwk-today',
    product: 'kit4',
    daysAgo: 2,
    quantity: 16,
    unit: 'kits',
    faults: { power: { units: [4, 9], realGauge: '6 AWG' } },
    decision: 'none',
    photo: 'undersized',
  },
  {
    key: 'hl10-today',
    product: 'spool1_0',
    daysAgo: 1,
    quantity: 6,
    unit: 'spools',
    strands: true,
    decision: 'none',
  },
  { key: 'ts25-today', product: 'spool25', daysAgo: 0, quantity: 6, unit: 'drums', measured: 3 },
  { key: 'hl4-today', product: 'spool4', daysAgo: 0, quantity: 8, unit: 'spools', measured: 0 },
];
