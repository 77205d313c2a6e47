import { StandardsInputError } from './errors.js';
import { largestSizeReached, measuresAs, type MeasuresAs } from './gauges/measures-as.js';
import { parseGauge } from './gauges/parse.js';
import type { Gauge } from './gauges/types.js';
import type { IdentifiedMaterial } from './identify-material.js';
import { materialById, type MaterialFamily, type MaterialId } from './materials.js';
import { requireNonNegative, requireOneOf, requirePositive } from './validate.js';

export type Verdict = 'conforms' | 'nonconforming' | 'inconclusive';
export type MaterialCheck =
  'not_checked' | 'as_claimed' | 'not_as_claimed' | 'inconsistent' | 'unknown';

export interface AssessSampleInput {
  /** The size the label claims: a `Gauge` or a label such as "4 AWG". */
  gauge: Gauge | string;
  claimedMaterial: MaterialId;
  areaMm2: number;
  /** Expanded uncertainty (k = 2) of `areaMm2`. */
  UMm2: number;
  identifiedMaterial?: IdentifiedMaterial;
  /** Minimum area as a fraction of nominal: 0.98 (ASTM B496); a per-product policy. */
  minAreaRatio?: number;
  /** Length of the specimen the reading came from, for `lengthForConclusiveMm`. Default 1000 mm. */
  sampleLengthMm?: number;
}

export interface SampleAssessment {
  verdict: Verdict;
  gauge: Gauge;
  areaRatio: number;
  minimumAreaMm2: number;
  measuresAs: MeasuresAs;
  /** DESIGN.md's "measures as": the largest size whose nominal area is reached, or null. */
  largestSizeReached: MeasuresAs | null;
  materialCheck: MaterialCheck;
  reasons: string[];
  /** When inconclusive on area: the specimen length that would decide it (same instruments). */
  lengthForConclusiveMm?: number;
}

const FAMILY_WORDS: Record<MaterialFamily | 'cca', string> = {
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
/** "an 8 AWG", "an 18 AWG", "a 4 AWG". */
const article = (label: string): string => (/^(8|11|18)\b/.test(label) ? 'an' : 'a');
const pct = (ratio: number): string => `${Math.round(ratio * 100)} %`;
const mm2 = (area: number): string => `${area.toFixed(area < 1 ? 3 : 2)} mm²`;

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
 * Verdict for one sample with guard bands w = U (ILAC-G8:09/2019 §4.2; ISO 14253-1):
 * conforms only when A − U reaches the minimum, nonconforming only when A + U stays below
 * it, inconclusive in between. A conductor found to be a cheaper metal than claimed
 * (copper sold, CCA or aluminium found) is nonconforming whatever its area.
 *
 * `lengthForConclusiveMm` assumes the mass method limited by instrument resolution: the
 * balance and rule resolutions are fixed amounts while mass and length grow with the
 * specimen, so U shrinks as 1/L and L = L₀ · U / |A − A_min| decides it. Stated relative
 * accuracies (e.g. a balance good to 0.1 % of reading) do not shrink; then it is a floor.
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
  const lengthMm = requirePositive('sampleLengthMm', input.sampleLengthMm ?? 1000);

  const minimumAreaMm2 = minRatio * gauge.nominalAreaMm2;
  const areaRatio = areaMm2 / gauge.nominalAreaMm2;
  const nearest = measuresAs(areaMm2, gauge.system);
  const materialCheck = checkMaterial(claimed.family, found);
  const metal = claimed.family === 'copper' ? 'the copper' : 'the conductor area';
  const reasons = [
    `Measures as ${nearest.gauge.label}: ${pct(areaRatio)} of ${metal} ${article(gauge.label)} ${gauge.label} label promises.`,
  ];
  const base = {
    gauge,
    areaRatio,
    minimumAreaMm2,
    measuresAs: nearest,
    largestSizeReached: largestSizeReached(areaMm2, gauge.system),
    materialCheck,
    reasons,
  };

  let verdict: Verdict;
  let lengthForConclusiveMm: number | undefined;
  if (areaMm2 - U >= minimumAreaMm2) {
    verdict = 'conforms';
    reasons.push(
      `At least the ${pct(minRatio)} minimum (${mm2(minimumAreaMm2)}) even allowing for the measurement uncertainty (±${mm2(U)}).`,
    );
  } else if (areaMm2 + U < minimumAreaMm2) {
    verdict = 'nonconforming';
    reasons.push(
      `Below the ${pct(minRatio)} minimum (${mm2(minimumAreaMm2)}) even allowing for the measurement uncertainty (±${mm2(U)}).`,
    );
  } else {
    verdict = 'inconclusive';
    const margin = Math.abs(areaMm2 - minimumAreaMm2);
    reasons.push(
      `Too close to the ${pct(minRatio)} minimum (${mm2(minimumAreaMm2)}) to decide: ${mm2(areaMm2)} ± ${mm2(U)} straddles it.`,
    );
    if (materialCheck === 'inconsistent') {
      // A longer sample does not fix a typo: the message below asks for new readings.
    } else if (margin > 0) {
      lengthForConclusiveMm = Math.ceil((lengthMm * U) / margin / 10) * 10;
      const assumed =
        input.sampleLengthMm === undefined ? ' (assuming this reading came from a 1 m sample)' : '';
      reasons.push(
        `Weigh a sample at least ${lengthForConclusiveMm} mm long with the same instruments to decide${assumed}.`,
      );
    } else {
      reasons.push(
        'The result sits exactly on the minimum: a longer sample cannot decide it; use a finer instrument or another method.',
      );
    }
  }

  if (materialCheck === 'not_as_claimed' && found !== undefined) {
    reasons.unshift(
      `Sold as ${FAMILY_WORDS[claimed.family]} but the readings show ${FAMILY_WORDS[found as MaterialFamily]}: nonconforming whatever its size.`,
    );
    return { ...base, verdict: 'nonconforming' };
  }
  if (materialCheck === 'inconsistent') {
    reasons.unshift(
      'The readings do not fit any known conductor metal, so the area cannot be trusted: check them for a typo and measure again.',
    );
    return { ...base, verdict: 'inconclusive' };
  }
  return lengthForConclusiveMm === undefined
    ? { ...base, verdict }
    : { ...base, verdict, lengthForConclusiveMm };
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
