/**
 * How a reading is written for a person on the other side (the supplier's quality
 * department): methods, materials and inputs in words with their units. The evidence pack
 * and the supplier CSV both print through these, so their labels agree.
 */

/** A method in words; a resistance reading says four-wire or two-wire. */
export function methodWords(method: string, fourWire?: boolean | null): string {
  switch (method) {
    case 'mass':
      return 'Mass and length';
    case 'strands':
      return 'Strands counted and measured';
    case 'resistance':
      return fourWire === false ? 'Resistance, two-wire' : 'Resistance, four-wire';
    case 'diameter':
      return 'Solid diameter';
    default:
      return method;
  }
}

/** The metal a reading found, in words; null when the readings could not tell. */
export function materialWords(material: string | null): string {
  switch (material) {
    case 'copper':
      return 'copper';
    case 'cca':
      return 'copper-clad aluminium';
    case 'aluminium':
      return 'aluminium';
    case 'inconsistent':
      return 'readings disagree';
    case 'unknown':
    case null:
      return 'not identified';
    default:
      return material;
  }
}

/** One raw input as printed: its label with the unit, and how a stored value reads in it. */
export interface InputColumn {
  /** Key in `Reading.inputs`. */
  key: string;
  /** Header / label with its unit, as the CSV and the evidence pack print it. */
  label: string;
  /** Word used inside a sentence ("mass 186.38 g"). */
  word: string;
  unit: string;
  /** Stored value → printed value (resistance is stored in Ω and printed in mΩ). */
  scale: number;
}

/**
 * The raw inputs, in the order a bench writes them. Resistance is printed in mΩ (what the
 * form and the import's `resistance_mohm` take), the stranding increment in percent.
 */
export const INPUT_COLUMNS: readonly InputColumn[] = [
  { key: 'massG', label: 'Mass (g)', word: 'mass', unit: 'g', scale: 1 },
  { key: 'lengthMm', label: 'Length (mm)', word: 'length', unit: 'mm', scale: 1 },
  { key: 'count', label: 'Strands counted', word: 'strands counted', unit: '', scale: 1 },
  {
    key: 'strandDiametersMm',
    label: 'Strand diameters (mm)',
    word: 'strand diameters',
    unit: 'mm',
    scale: 1,
  },
  { key: 'resistanceOhm', label: 'Resistance (mΩ)', word: 'resistance', unit: 'mΩ', scale: 1000 },
  { key: 'temperatureC', label: 'Temperature (°C)', word: 'temperature', unit: '°C', scale: 1 },
  {
    key: 'diameterMm',
    label: 'Overall diameter (mm)',
    word: 'diameter',
    unit: 'mm',
    scale: 1,
  },
  {
    key: 'strandingIncrement',
    label: 'Stranding increment (%)',
    word: 'stranding increment',
    unit: '%',
    scale: 100,
  },
];

/**
 * A raw input in full, scaled to its printed unit without binary noise: 0.000805 Ω prints
 * as 0.805 mΩ, not 0.8049999999999999 (twelve significant figures keep every digit a
 * person typed and drop the float's tail).
 */
export function rawNumber(value: number, scale = 1): number {
  return Number((value * scale).toPrecision(12));
}

/** The value of an input for its column: a number, several joined by "; ", or null. */
export function inputValue(
  inputs: Record<string, number | number[] | undefined>,
  column: InputColumn,
): number | string | null {
  let v = inputs[column.key];
  // Readings made before the list held a single strand diameter.
  if (v === undefined && column.key === 'strandDiametersMm') v = inputs.strandDiameterMm;
  if (v === undefined || v === null) return null;
  if (Array.isArray(v)) return v.map((x) => rawNumber(x, column.scale)).join('; ');
  return rawNumber(v, column.scale);
}

/** "mass 186.38 g, length 1000 mm": the inputs of a reading in words with units. */
export function inputsInWords(inputs: Record<string, number | number[] | undefined>): string {
  const parts: string[] = [];
  for (const c of INPUT_COLUMNS) {
    const v = inputValue(inputs, c);
    if (v === null) continue;
    parts.push(`${c.word} ${v}${c.unit ? (c.unit === '%' ? ' %' : ` ${c.unit}`) : ''}`);
  }
  return parts.join(', ');
}

/** yes / no for a flag; empty for a flag that does not apply. */
export const yesNo = (v: boolean | null | undefined): string =>
  v === null || v === undefined ? '' : v ? 'yes' : 'no';

/** "2026-11-03 14:05" in UTC, the form the evidence pack prints (its header says UTC). */
export const utcMinute = (d: Date | null | undefined): string =>
  d ? d.toISOString().slice(0, 16).replace('T', ' ') : '';
