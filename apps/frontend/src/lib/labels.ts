/**
 * The one wording of each of the API's enums (docs/api-conventions.md) on screen. A label is
 * written as it stands alone (a chip, a menu item, a column); `inSentence` gives the same
 * word inside a sentence ("Sold as copper"), so no screen keeps a second wording of its own.
 */

export const lotStatusLabels = {
  on_hold: 'On hold',
  inspecting: 'Inspecting',
  awaiting_decision: 'Awaiting decision',
  accepted: 'Accepted',
  accepted_on_concession: 'Accepted on concession',
  rejected: 'Rejected',
  returned: 'Returned',
} as const;

/** What the label promises; CCA classes as ASTM B566 names them (copper share by volume). */
export const claimedMaterialLabels = {
  copper: 'Copper',
  tinned_copper: 'Tinned copper',
  cca10: 'CCA class 10A (10 % copper)',
  cca15: 'CCA class 15A (15 % copper)',
  aluminium: 'Aluminium',
} as const;

export const conductorPurposeLabels = {
  power: 'Power',
  ground: 'Ground',
  remote: 'Remote turn-on',
  speaker: 'Speaker',
  other: 'Other',
} as const;

/** ISO 2859-1 switching states of a product's inspection. */
export const inspectionSeverityLabels = {
  normal: 'Normal inspection',
  tightened: 'Tightened inspection',
  reduced: 'Reduced inspection',
  discontinued: 'Inspection discontinued',
} as const;

export const instrumentKindLabels = {
  balance: 'Balance',
  micrometer: 'Micrometer',
  caliper: 'Caliper',
  length_rule: 'Length rule',
  milliohm_meter: 'Milliohm meter',
  thermometer: 'Thermometer',
} as const;

/** A label inside a sentence: its first letter small unless it opens an abbreviation (CCA). */
export function inSentence(label: string): string {
  return /^[A-Z][a-z ]/.test(label) ? label[0].toLowerCase() + label.slice(1) : label;
}

/** The label of an enum value that arrives as a plain string; an unknown one reads as itself. */
export function labelOf(labels: Readonly<Record<string, string>>, value: string): string {
  return labels[value] ?? value.replace(/_/g, ' ');
}
