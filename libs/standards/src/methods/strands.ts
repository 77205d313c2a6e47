import { circleAreaMm2 } from '../units.js';
import { areaResult, component, type AreaResult, type BudgetComponent } from '../uncertainty.js';
import { requireInteger } from '../validate.js';
import { reading } from './common.js';

export interface AreaFromStrandsInput {
  /** Number of strands, counted. */
  count: number;
  /**
   * Strand diameter, mm: one reading or several (measure at least three strands with a
   * micrometer and average; common practice, REFERENCE §3).
   */
  strandDiameterMm: number | readonly number[];
  /** Micrometer resolution, mm. Default 0.001 mm (issue 3). */
  diameterResolutionMm?: number;
}

/**
 * Cross-section from the strands: A = n · π d² / 4 (REFERENCE §3). d enters squared, so a
 * 1 % error in d is a 2 % error in A. The count is counted and taken as exact.
 */
export function areaFromStrands(input: AreaFromStrandsInput): AreaResult {
  const count = requireInteger('count', input.count, 1);
  const d = reading(
    'strandDiameterMm',
    input.strandDiameterMm,
    'diameterResolutionMm',
    input.diameterResolutionMm ?? 0.001,
  );
  const areaMm2 = count * circleAreaMm2(d.value);
  const budget: BudgetComponent[] = [
    component(
      d.count > 1 ? `strand diameter (mean of ${d.count})` : 'strand diameter',
      d.value,
      'mm',
      d.uResolution,
      2,
      'micrometer resolution δ/√12 (GUM F.2.2.1); d enters squared',
    ),
  ];
  if (d.count > 1) {
    budget.push(
      component(
        'spread of strand readings',
        d.value,
        'mm',
        d.uSpread,
        2,
        'standard deviation of the mean s/√n (GUM 4.2.3)',
      ),
    );
  }
  budget.push(component('strand count', count, 'strands', 0, 1, 'counted, taken as exact'));
  return areaResult(
    areaMm2,
    budget,
    'The strand count is counted and taken as exact; the micrometer readings carry the uncertainty. Assumes every strand has the measured diameter.',
  );
}
