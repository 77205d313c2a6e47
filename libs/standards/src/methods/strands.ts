import { StandardsInputError } from '../errors.js';
import { circleAreaMm2 } from '../units.js';
import {
  areaResult,
  component,
  instrumentComponents,
  type AreaResult,
  type InstrumentAccuracy,
} from '../uncertainty.js';
import { requireInteger } from '../validate.js';
import { checkAccuracy, reading, spreadComponent } from './common.js';

/** Strand readings one sample may carry: 1 to 10 (issue 13; three or more recommended). */
export const MAX_STRAND_DIAMETERS = 10;
/** Measure at least three strands and average (common practice, REFERENCE §3). */
export const RECOMMENDED_STRAND_DIAMETERS = 3;

export interface AreaFromStrandsInput {
  /** Number of strands, counted. */
  count: number;
  /**
   * Strand diameters, mm: one reading or several, each of a different strand (measure at
   * least three strands with a micrometer and average; common practice, REFERENCE §3).
   */
  strandDiameterMm: number | readonly number[];
  /** Micrometer resolution, mm. Default 0.001 mm (issue 3). */
  diameterResolutionMm?: number;
  /** The micrometer's stated accuracy and calibration, mm (instrument register). */
  micrometer?: InstrumentAccuracy;
}

/**
 * Cross-section from the strands: A = n · π d² / 4 (REFERENCE §3), d the mean strand
 * diameter. d enters squared, so a 1 % error in d is a 2 % error in A. The count is counted
 * and taken as exact. The spread of the strands is a Type A term with ν = n − 1; with few
 * strands k comes from Welch–Satterthwaite (GUM G.4.1), not a fixed 2.
 */
export function areaFromStrands(input: AreaFromStrandsInput): AreaResult {
  const count = requireInteger('count', input.count, 1);
  const values = Array.isArray(input.strandDiameterMm)
    ? input.strandDiameterMm
    : [input.strandDiameterMm];
  if (values.length > MAX_STRAND_DIAMETERS) {
    throw new StandardsInputError(
      'strandDiameterMm',
      `strandDiameterMm takes 1 to ${MAX_STRAND_DIAMETERS} strand readings (got ${values.length}).`,
    );
  }
  const resolution = input.diameterResolutionMm ?? 0.001;
  const d = reading('strandDiameterMm', input.strandDiameterMm, 'diameterResolutionMm', resolution);
  const micrometer = checkAccuracy('micrometer', input.micrometer);
  const areaMm2 = count * circleAreaMm2(d.value);
  const name = d.count > 1 ? `strand diameter (mean of ${d.count})` : 'strand diameter';
  return areaResult(
    areaMm2,
    [
      ...instrumentComponents(name, d.value, 'mm', 2, resolution, micrometer, {
        resolutionNote: 'micrometer resolution',
      }),
      ...spreadComponent('spread of strand diameters', d, 'mm', 2),
      component('strand count', count, 'strands', 0, 1, 'counted, taken as exact'),
    ],
    `The strand count is counted and taken as exact; the micrometer and the spread of the strands carry the uncertainty (d enters squared).${d.count < RECOMMENDED_STRAND_DIAMETERS ? ` Only ${d.count} strand${d.count === 1 ? '' : 's'} measured: three or more are recommended.` : ''}`,
  );
}
