import type {
  ClaimedMaterial,
  ConductorPurpose,
  InspectionSeverity,
  InstrumentKind,
  LotStatus,
} from '@gaugeproof/api-types';

/**
 * The one wording of each of the contract's enums (libs/api-types) on screen. Each map
 * covers every value of its enum, so a value added to the contract fails the typecheck
 * until it has its words here. A label is written as it stands alone (a chip, a menu item,
 * a column); `inSentence` gives the same word inside a sentence ("Sold as copper"), so no
 * screen keeps a second wording of its own.
 */

export const lotStatusLabels = {
  on_hold: 'On hold',
  inspecting: 'Inspecting',
  awaiting_decision: 'Awaiting decision',
  accepted: 'Accepted',
  accepted_on_concession: 'Accepted on concession',
  rejected: 'Rejected',
  returned: 'Returned',
} as const satisfies Record<LotStatus, string>;

/** What the label promises; CCA classes as ASTM B566 names them (copper share by volume). */
export const claimedMaterialLabels = {
  copper: 'Copper',
  tinned_copper: 'Tinned copper',
  cca10: 'CCA class 10A (10 % copper)',
  cca15: 'CCA class 15A (15 % copper)',
  aluminium: 'Aluminium',
} as const satisfies Record<ClaimedMaterial, string>;

export const conductorPurposeLabels = {
  power: 'Power',
  ground: 'Ground',
  remote: 'Remote turn-on',
  speaker: 'Speaker',
  other: 'Other',
} as const satisfies Record<ConductorPurpose, string>;

/** ISO 2859-1 switching states of a product's inspection. */
export const inspectionSeverityLabels = {
  normal: 'Normal inspection',
  tightened: 'Tightened inspection',
  reduced: 'Reduced inspection',
  discontinued: 'Inspection discontinued',
} as const satisfies Record<InspectionSeverity, string>;

export const instrumentKindLabels = {
  balance: 'Balance',
  micrometer: 'Micrometer',
  caliper: 'Caliper',
  length_rule: 'Length rule',
  milliohm_meter: 'Milliohm meter',
  thermometer: 'Thermometer',
} as const satisfies Record<InstrumentKind, string>;

/** A label inside a sentence: its first letter small unless it opens an abbreviation (CCA). */
export function inSentence(label: string): string {
  return /^[A-Z][a-z ]/.test(label) ? label[0].toLowerCase() + label.slice(1) : label;
}

/** The label of an enum value that arrives as a plain string; an unknown one reads as itself. */
export function labelOf(labels: Readonly<Record<string, string>>, value: string): string {
  return labels[value] ?? value.replace(/_/g, ' ');
}
