import {
  DEFAULT_CONDUCTOR_CLASS,
  iec60228MaxResistance,
  requireConductorClass,
  type ConductorClass,
  type ResistanceLimit,
} from './conductors/iec60228.js';
import { StandardsInputError } from './errors.js';
import { formatPercent, formatWithUncertainty } from './format.js';
import {
  BELOW_SMALLEST_SIZE,
  conductorMeasuresAs,
  nextSmallerSize,
  type ConductorMeasuresAs,
} from './gauges/measures-as.js';
import { parseGauge } from './gauges/parse.js';
import type { Gauge } from './gauges/types.js';
import type { IdentifiedMaterial } from './identify-material.js';
import { installerConsequence, type InstallerConsequence } from './installer.js';
import {
  MATERIALS,
  materialById,
  type Material,
  type MaterialFamily,
  type MaterialId,
} from './materials.js';
import { requireIncrement, STANDARD_STRANDING_INCREMENT } from './methods/common.js';
import { requireNonNegative, requireOneOf, requirePositive } from './validate.js';

export const VERDICTS = ['conforms', 'nonconforming', 'inconclusive'] as const;
export type Verdict = (typeof VERDICTS)[number];
export type MaterialCheck =
  'not_checked' | 'as_claimed' | 'not_as_claimed' | 'inconsistent' | 'unknown';
/** The four ways a reading finds a conductor's cross-section. */
export const READING_METHODS = ['mass', 'strands', 'resistance', 'diameter'] as const;
export type ReadingMethod = (typeof READING_METHODS)[number];
/** What the verdict compares: the area (AWG, ASTM B258) or the resistance (metric, IEC 60228). */
export const CRITERIA = ['area', 'resistance'] as const;
export type Criterion = (typeof CRITERIA)[number];

/** Longest specimen we advise cutting for a conclusive result, mm (common practice, no source). */
export const PRACTICAL_SPECIMEN_LENGTH_MM = 5000;

export interface AssessSampleInput {
  /** The size the label claims: a `Gauge` or a label such as "4 AWG". */
  gauge: Gauge | string;
  claimedMaterial: MaterialId;
  areaMm2: number;
  /** Expanded uncertainty of `areaMm2`. */
  UMm2: number;
  identifiedMaterial?: IdentifiedMaterial;
  /** The closest known grade when identified (e.g. 'cca15'), for the conducting resistivity. */
  identifiedGrade?: MaterialId;
  /** Minimum area as a fraction of nominal: 0.98 (ASTM B496); a per-product policy. AWG only. */
  minAreaRatio?: number;
  /** IEC 60228 class of a metric conductor: 1, 2, 5 or 6 (default 5). */
  conductorClass?: ConductorClass;
  /** Stranding increment k, for the resistance a metric conductor's area implies. Default 0.02. */
  strandingIncrement?: number;
  /** The method the area came from: the length advice is for mass and resistance only. */
  method?: ReadingMethod;
  /** A resistance reading's connection: false (two-wire) never concludes (REFERENCE §4). */
  fourWire?: boolean;
  /** Length of the specimen the reading came from, mm. Default 1000 mm. */
  sampleLengthMm?: number;
  /**
   * U (mm²) the same instruments would give for this area on a specimen of `lengthMm`: the
   * method run again at that length. Without it U is taken to shrink as 1/L.
   */
  uncertaintyAtLength?: (lengthMm: number) => number;
}

export interface SampleAssessment {
  verdict: Verdict;
  gauge: Gauge;
  criterion: Criterion;
  /** Measured area ÷ nominal area (information; the verdict of a metric copper conductor is by resistance). */
  areaRatio: number;
  minimumAreaMm2: number;
  /** Metric copper: resistance at 20 °C per km of cable, its U, the IEC 60228 limit and its table. */
  resistanceOhmPerKm?: number;
  UResistanceOhmPerKm?: number;
  limit?: ResistanceLimit;
  /** The one "measures as" (issue 13). */
  measuresAs: ConductorMeasuresAs;
  materialCheck: MaterialCheck;
  reasons: string[];
  /** When a longer specimen of the same cable would decide it, its length, mm (≤ 5 m). */
  lengthForConclusiveMm?: number;
  /** The sentence on specimen length, when there is one ("not practical; use another method"). */
  lengthAdvice?: string;
  /** For a short conductor: the size to treat it as, with the installer's caution. */
  consequence?: InstallerConsequence;
}

const FAMILY_WORDS: Record<MaterialFamily, string> = {
  copper: 'copper',
  cca: 'copper-clad aluminium (CCA)',
  aluminium: 'aluminium',
};
const IDENTIFIED: readonly IdentifiedMaterial[] = [
  'copper',
  'cca',
  'aluminium',
  'inconsistent',
  'unknown',
];
const METHODS: readonly ReadingMethod[] = ['mass', 'strands', 'resistance', 'diameter'];
/** "an 8 AWG", "an 18 AWG", "a 4 AWG". */
const article = (label: string): string => (/^(8|11|18)\b/.test(label) ? 'an' : 'a');
/** Worst grade of a family, for when only the family is known (ASTM B566 class 10A for CCA). */
const FAMILY_GRADE: Record<MaterialFamily, Material> = {
  copper: MATERIALS.copper,
  cca: MATERIALS.cca10,
  aluminium: MATERIALS.aluminium,
};

/** Copper (plain or tinned) must not be CCA or aluminium; CCA must not be plain aluminium. */
function checkMaterial(
  claimed: MaterialFamily,
  found: IdentifiedMaterial | undefined,
): MaterialCheck {
  if (found === undefined) return 'not_checked';
  if (found === 'inconsistent' || found === 'unknown') return found;
  const rank = { copper: 2, cca: 1, aluminium: 0 };
  return rank[found] < rank[claimed] ? 'not_as_claimed' : 'as_claimed';
}

/**
 * Verdict for one sample with guard bands w = U (ILAC-G8:09/2019 §4.2; ISO 14253-1).
 *
 * - AWG sizes (and metric sizes of metals IEC 60228 has no limits for): the area against the
 *   product's minimum fraction of nominal (98 % by default, ASTM B496; nominal per ASTM B258).
 * - Metric copper and tinned copper: IEC 60228 judges by maximum resistance at 20 °C (Tables
 *   1–3), not by area. A resistance reading is compared directly; a mass, strand or diameter
 *   reading through the resistance its area implies for the claimed metal,
 *   R₂₀ = ρ₂₀ (1 + k) / A per cable metre (REFERENCE §2), with the same relative U.
 *
 * Conforms only when the result is inside the limit by at least U, nonconforming only when
 * outside by at least U, inconclusive between. A conductor found to be a cheaper metal than
 * claimed is nonconforming whatever its size; a two-wire resistance reading never concludes.
 */
export function assessSample(input: AssessSampleInput): SampleAssessment {
  const gauge = typeof input.gauge === 'string' ? parseGauge(input.gauge) : checkGauge(input.gauge);
  const claimed = materialById(input.claimedMaterial, 'claimedMaterial');
  const areaMm2 = requirePositive('areaMm2', input.areaMm2);
  const U = requireNonNegative('UMm2', input.UMm2);
  const found =
    input.identifiedMaterial === undefined
      ? undefined
      : requireOneOf('identifiedMaterial', input.identifiedMaterial, IDENTIFIED);
  const minRatio = requirePositive('minAreaRatio', input.minAreaRatio ?? 0.98);
  if (minRatio > 1.5)
    throw new StandardsInputError(
      'minAreaRatio',
      'minAreaRatio is a fraction such as 0.98 for 98 %.',
    );
  const conductorClass = requireConductorClass(input.conductorClass ?? DEFAULT_CONDUCTOR_CLASS);
  const k = requireIncrement(input.strandingIncrement ?? STANDARD_STRANDING_INCREMENT);
  const method =
    input.method === undefined ? undefined : requireOneOf('method', input.method, METHODS);
  const lengthMm = requirePositive('sampleLengthMm', input.sampleLengthMm ?? 1000);
  const twoWire = method === 'resistance' && input.fourWire === false;

  const materialCheck = checkMaterial(claimed.family, found);
  const mismatch = materialCheck === 'not_as_claimed' && found !== undefined;
  // The metal that really conducts: the claimed one, or the cheaper one the readings found.
  const conducting: Material = mismatch
    ? input.identifiedGrade
      ? materialById(input.identifiedGrade, 'identifiedGrade')
      : FAMILY_GRADE[found as MaterialFamily]
    : claimed;
  // A strand or diameter area is geometric: a cheaper metal conducts like less copper.
  const geometric = method === 'strands' || method === 'diameter';
  const conductingArea =
    mismatch && geometric
      ? (areaMm2 * claimed.resistivityOhmMm2PerM) / conducting.resistivityOhmMm2PerM
      : areaMm2;

  const byResistance = gauge.system === 'metric' && claimed.family === 'copper';
  const coating = claimed.id === 'tinned_copper' ? 'tinned' : 'plain';
  const minimumAreaMm2 = minRatio * gauge.nominalAreaMm2;
  const areaRatio = areaMm2 / gauge.nominalAreaMm2;
  const relU = U / areaMm2;

  let verdict: Verdict;
  let value: number;
  let limitValue: number;
  const reasons: string[] = [];
  const extra: Partial<SampleAssessment> = {};
  let measures: ConductorMeasuresAs;

  if (byResistance) {
    const limit = iec60228MaxResistance(gauge.nominalAreaMm2, conductorClass, coating);
    const r = (claimed.resistivityOhmMm2PerM * (1 + k) * 1000) / conductingArea;
    const uR = r * relU;
    extra.resistanceOhmPerKm = r;
    extra.UResistanceOhmPerKm = uR;
    extra.limit = limit;
    value = r;
    limitValue = limit.maxOhmPerKm;
    measures = conductorMeasuresAs({
      system: 'metric',
      areaMm2: conductingArea,
      resistanceOhmPerKm: r,
      maxOhmPerKm: (a) => iec60228MaxResistance(a, conductorClass, coating).maxOhmPerKm,
    });
    const stated = `${formatWithUncertainty(r, uR, 'Ω/km')} at 20 °C against IEC 60228's maximum ${limit.maxOhmPerKm} Ω/km (${limit.source})`;
    reasons.push(
      `Measures as ${measures.label}: resistance ${formatPercent(r / limit.maxOhmPerKm)} of the maximum a ${gauge.label} class ${conductorClass} conductor may have.`,
    );
    if (r + uR <= limit.maxOhmPerKm) {
      verdict = 'conforms';
      reasons.push(`Within the maximum even allowing for the measurement uncertainty: ${stated}.`);
    } else if (r - uR > limit.maxOhmPerKm) {
      verdict = 'nonconforming';
      reasons.push(`Above the maximum even allowing for the measurement uncertainty: ${stated}.`);
    } else {
      verdict = 'inconclusive';
      reasons.push(`Too close to the maximum to decide: ${stated}.`);
    }
  } else {
    value = conductingArea;
    limitValue = minimumAreaMm2;
    measures = conductorMeasuresAs({
      system: gauge.system,
      areaMm2: conductingArea,
      minAreaRatio: minRatio,
    });
    const metal = claimed.family === 'copper' ? 'the copper' : 'the conductor area';
    reasons.push(
      `Measures as ${measures.label}: ${formatPercent(areaRatio)} of ${metal} ${article(gauge.label)} ${gauge.label} label promises.`,
    );
    const minimum = `the ${formatPercent(minRatio)} minimum (${Number(minimumAreaMm2.toPrecision(4))} mm²)`;
    const stated = formatWithUncertainty(areaMm2, U, 'mm²');
    if (areaMm2 - U >= minimumAreaMm2) {
      verdict = 'conforms';
      reasons.push(`At least ${minimum} even allowing for the measurement uncertainty: ${stated}.`);
    } else if (areaMm2 + U < minimumAreaMm2) {
      verdict = 'nonconforming';
      reasons.push(`Below ${minimum} even allowing for the measurement uncertainty: ${stated}.`);
    } else {
      verdict = 'inconclusive';
      reasons.push(`Too close to ${minimum} to decide: ${stated} straddles it.`);
    }
  }

  // Forced verdicts: the metal, a typo, a two-wire reading.
  if (mismatch) {
    reasons.unshift(
      `Sold as ${FAMILY_WORDS[claimed.family]} but the readings show ${FAMILY_WORDS[found as MaterialFamily]}: nonconforming whatever its size.`,
    );
    verdict = 'nonconforming';
  } else if (materialCheck === 'inconsistent') {
    reasons.unshift(
      'The readings do not fit any known conductor metal, so the result cannot be trusted: check them for a typo and measure again.',
    );
    verdict = 'inconclusive';
  } else if (twoWire) {
    reasons.unshift(
      'Two-wire resistance reading: the leads add more than a metre of cable, so it is kept for the record but decides nothing. Measure four-wire (Kelvin) to decide.',
    );
    verdict = 'inconclusive';
  } else if (verdict === 'inconclusive') {
    const advice = lengthAdvice(
      input,
      method,
      lengthMm,
      areaMm2,
      U,
      Math.abs(value - limitValue) / value,
    );
    if (advice.lengthMm !== undefined) extra.lengthForConclusiveMm = advice.lengthMm;
    extra.lengthAdvice = advice.text;
    reasons.push(advice.text);
  }

  // A nonconforming sample never measures as its label (issue 13).
  if (
    verdict === 'nonconforming' &&
    measures.gauge &&
    measures.gauge.nominalAreaMm2 >= gauge.nominalAreaMm2
  ) {
    const smaller = nextSmallerSize(gauge);
    measures = smaller
      ? { label: smaller.label, gauge: smaller }
      : { label: BELOW_SMALLEST_SIZE, gauge: null };
    reasons[mismatch ? 1 : 0] = reasons[mismatch ? 1 : 0].replace(
      /^Measures as [^:]+:/,
      `Measures as ${measures.label}:`,
    );
  }
  const consequence =
    verdict === 'nonconforming' ? installerConsequence(gauge, measures) : undefined;

  return {
    verdict,
    gauge,
    criterion: byResistance ? 'resistance' : 'area',
    areaRatio,
    minimumAreaMm2,
    ...extra,
    measuresAs: measures,
    materialCheck,
    reasons,
    ...(consequence ? { consequence } : {}),
  };
}

/**
 * How long a specimen of the same cable would decide an inconclusive result: only for the
 * mass and resistance methods, whose quantities grow with the specimen (a strand or a
 * diameter does not). The instruments' fixed terms shrink as 1/L, a percentage-of-reading
 * term does not, so the method is run again at each length (`uncertaintyAtLength`). Beyond
 * 5 m it is not practical (common practice, no source).
 */
function lengthAdvice(
  input: AssessSampleInput,
  method: ReadingMethod | undefined,
  lengthMm: number,
  areaMm2: number,
  U: number,
  relativeMargin: number,
): { lengthMm?: number; text: string } {
  if (method === 'strands' || method === 'diameter') {
    return {
      text: 'A longer specimen does not help this method: measure more strands, use a finer micrometer, or weigh a specimen (mass method).',
    };
  }
  if (relativeMargin === 0) {
    return {
      text: 'The result sits exactly on the limit: a longer specimen cannot decide it; use a finer instrument or another method.',
    };
  }
  const uAt = input.uncertaintyAtLength ?? ((l: number) => (U * lengthMm) / l);
  const decides = (l: number): boolean => uAt(l) / areaMm2 < relativeMargin;
  if (!decides(PRACTICAL_SPECIMEN_LENGTH_MM)) {
    return {
      text: `Even a ${PRACTICAL_SPECIMEN_LENGTH_MM / 1000} m specimen would not decide it with these instruments: not practical; use another method or finer instruments.`,
    };
  }
  // Smallest length in 10 mm steps that decides it (U falls as the specimen grows).
  let lo = Math.max(10, Math.ceil(lengthMm / 10) * 10);
  let hi = PRACTICAL_SPECIMEN_LENGTH_MM;
  if (decides(lo)) lo = 10;
  while (lo < hi) {
    const mid = Math.floor((lo + hi) / 20) * 10;
    if (mid <= lo) break;
    if (decides(mid)) hi = mid;
    else lo = mid;
  }
  const assumed =
    input.sampleLengthMm === undefined ? ' (assuming this reading came from a 1 m sample)' : '';
  const what = method === 'resistance' ? 'Measure the resistance over' : 'Weigh';
  return {
    lengthMm: hi,
    text: `${what} a specimen at least ${hi} mm long with the same instruments to decide${assumed}.`,
  };
}

function checkGauge(gauge: Gauge): Gauge {
  if (typeof gauge !== 'object' || gauge === null || typeof gauge.label !== 'string') {
    throw new StandardsInputError(
      'gauge',
      'gauge must be a size such as "4 AWG" or a parsed gauge.',
    );
  }
  return parseGauge(gauge.label);
}
