import { StandardsInputError } from '../errors.js';
import { METRIC_AREAS_MM2 } from '../gauges/metric.js';

/** IEC 60228 conductor classes: 1 solid, 2 stranded (fixed installation), 5 and 6 flexible. */
export const CONDUCTOR_CLASSES = [1, 2, 5, 6] as const;
export type ConductorClass = (typeof CONDUCTOR_CLASSES)[number];

/** Default class: 5, the flexible class of vehicle power cable (issue 13; common practice). */
export const DEFAULT_CONDUCTOR_CLASS: ConductorClass = 5;

/** Plain annealed copper, or metal-coated (tinned) annealed copper. */
export type CopperCoating = 'plain' | 'tinned';

/**
 * Maximum DC resistance of annealed copper conductors at 20 °C, Ω/km, per nominal area
 * (mm²), as [plain, metal-coated]. `null` where the table gives no value.
 */
type Row = readonly [plain: number, tinned: number | null];

/** IEC 60228 Table 1, class 1 solid conductors (metal-coated only up to 16 mm²). */
const CLASS_1: Readonly<Record<number, Row>> = {
  0.5: [36.0, 36.7], // IEC 60228 Table 1
  0.75: [24.5, 24.8], // IEC 60228 Table 1
  1: [18.1, 18.2], // IEC 60228 Table 1
  1.5: [12.1, 12.2], // IEC 60228 Table 1
  2.5: [7.41, 7.56], // IEC 60228 Table 1
  4: [4.61, 4.7], // IEC 60228 Table 1
  6: [3.08, 3.11], // IEC 60228 Table 1
  10: [1.83, 1.84], // IEC 60228 Table 1
  16: [1.15, 1.16], // IEC 60228 Table 1
  25: [0.727, null], // IEC 60228 Table 1
  35: [0.524, null], // IEC 60228 Table 1
  50: [0.387, null], // IEC 60228 Table 1
  70: [0.268, null], // IEC 60228 Table 1
  95: [0.193, null], // IEC 60228 Table 1
  120: [0.153, null], // IEC 60228 Table 1
  150: [0.124, null], // IEC 60228 Table 1
  185: [0.101, null], // IEC 60228 Table 1
  240: [0.0775, null], // IEC 60228 Table 1
};

/** IEC 60228 Table 2, class 2 stranded conductors. */
const CLASS_2: Readonly<Record<number, Row>> = {
  0.5: [36.0, 36.7], // IEC 60228 Table 2
  0.75: [24.5, 24.8], // IEC 60228 Table 2
  1: [18.1, 18.2], // IEC 60228 Table 2
  1.5: [12.1, 12.2], // IEC 60228 Table 2
  2.5: [7.41, 7.56], // IEC 60228 Table 2
  4: [4.61, 4.7], // IEC 60228 Table 2
  6: [3.08, 3.11], // IEC 60228 Table 2
  10: [1.83, 1.84], // IEC 60228 Table 2
  16: [1.15, 1.16], // IEC 60228 Table 2
  25: [0.727, 0.734], // IEC 60228 Table 2
  35: [0.524, 0.529], // IEC 60228 Table 2
  50: [0.387, 0.391], // IEC 60228 Table 2
  70: [0.268, 0.27], // IEC 60228 Table 2
  95: [0.193, 0.195], // IEC 60228 Table 2
  120: [0.153, 0.154], // IEC 60228 Table 2
  150: [0.124, 0.126], // IEC 60228 Table 2
  185: [0.0991, 0.1], // IEC 60228 Table 2
  240: [0.0754, 0.0762], // IEC 60228 Table 2
};

/** IEC 60228 Table 3, class 5 flexible conductors; class 6 (Table 4) has the same limits. */
const CLASS_5_6: Readonly<Record<number, Row>> = {
  0.5: [39.0, 40.1], // IEC 60228 Table 3
  0.75: [26.0, 26.7], // IEC 60228 Table 3
  1: [19.5, 20.0], // IEC 60228 Table 3
  1.5: [13.3, 13.7], // IEC 60228 Table 3
  2.5: [7.98, 8.21], // IEC 60228 Table 3
  4: [4.95, 5.09], // IEC 60228 Table 3
  6: [3.3, 3.39], // IEC 60228 Table 3
  10: [1.91, 1.95], // IEC 60228 Table 3
  16: [1.21, 1.24], // IEC 60228 Table 3
  25: [0.78, 0.795], // IEC 60228 Table 3
  35: [0.554, 0.565], // IEC 60228 Table 3
  50: [0.386, 0.393], // IEC 60228 Table 3
  70: [0.272, 0.277], // IEC 60228 Table 3
  95: [0.206, 0.21], // IEC 60228 Table 3
  120: [0.161, 0.164], // IEC 60228 Table 3
  150: [0.129, 0.132], // IEC 60228 Table 3
  185: [0.106, 0.108], // IEC 60228 Table 3
  240: [0.0801, 0.0817], // IEC 60228 Table 3
};

const TABLES: Record<ConductorClass, { rows: Readonly<Record<number, Row>>; table: string }> = {
  1: { rows: CLASS_1, table: 'IEC 60228 Table 1 (class 1)' },
  2: { rows: CLASS_2, table: 'IEC 60228 Table 2 (class 2)' },
  5: { rows: CLASS_5_6, table: 'IEC 60228 Table 3 (class 5)' },
  6: { rows: CLASS_5_6, table: 'IEC 60228 Table 3 (class 5; class 6 has the same limits)' },
};

/** A limit and the table it comes from. */
export interface ResistanceLimit {
  areaMm2: number;
  conductorClass: ConductorClass;
  coating: CopperCoating;
  /** Maximum DC resistance at 20 °C, Ω/km. */
  maxOhmPerKm: number;
  /** The table named, e.g. "IEC 60228 Table 3 (class 5), tinned". */
  source: string;
}

/** `StandardsInputError('conductorClass')` unless 1, 2, 5 or 6. */
export function requireConductorClass(value: unknown): ConductorClass {
  if (!CONDUCTOR_CLASSES.includes(value as ConductorClass)) {
    throw new StandardsInputError(
      'conductorClass',
      `conductorClass must be 1, 2, 5 or 6 (IEC 60228 classes; got ${String(value)}).`,
    );
  }
  return value as ConductorClass;
}

/**
 * IEC 60228 maximum resistance at 20 °C of a copper conductor of nominal `areaMm2`.
 * Class 1 tinned above 16 mm² has no value in Table 1: the larger of Table 1's plain value and
 * Table 2's metal-coated value is used, and the source says so.
 */
export function iec60228MaxResistance(
  areaMm2: number,
  conductorClass: ConductorClass,
  coating: CopperCoating,
): ResistanceLimit {
  const cls = requireConductorClass(conductorClass);
  if (!METRIC_AREAS_MM2.includes(areaMm2)) {
    throw new StandardsInputError('areaMm2', `${areaMm2} mm² is not an IEC 60228 size we hold.`);
  }
  const { rows, table } = TABLES[cls];
  const row = rows[areaMm2];
  if (coating === 'plain') {
    return {
      areaMm2,
      conductorClass: cls,
      coating,
      maxOhmPerKm: row[0],
      source: `${table}, plain copper`,
    };
  }
  if (row[1] !== null) {
    return {
      areaMm2,
      conductorClass: cls,
      coating,
      maxOhmPerKm: row[1],
      source: `${table}, metal-coated (tinned) copper`,
    };
  }
  // Table 1 has no metal-coated solid conductor above 16 mm²: take the more lenient of Table 1's
  // plain value and Table 2's metal-coated one, and say so.
  const fallback = Math.max(row[0], CLASS_2[areaMm2][1] as number);
  return {
    areaMm2,
    conductorClass: cls,
    coating,
    maxOhmPerKm: fallback,
    source:
      'IEC 60228 Table 1 gives no metal-coated value above 16 mm²: the larger of Table 1 plain and Table 2 metal-coated',
  };
}
