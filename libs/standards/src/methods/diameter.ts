import { circleAreaMm2 } from '../units.js';
import { areaResult, component, type AreaResult, type BudgetComponent } from '../uncertainty.js';
import { reading } from './common.js';

export interface AreaFromDiameterInput {
  /** Diameter of a solid conductor, mm: one reading or several (e.g. at right angles). */
  diameterMm: number | readonly number[];
  /** Micrometer resolution, mm. Default 0.001 mm (as for strands, issue 3). */
  diameterResolutionMm?: number;
}

/**
 * Cross-section of a solid, round conductor: A = π d² / 4. Not for stranded cable: a
 * bundle's outside diameter is a screen only (a 7-strand bundle measures about 13 % over
 * the solid diameter; common practice, REFERENCE §3).
 */
export function areaFromDiameter(input: AreaFromDiameterInput): AreaResult {
  const d = reading(
    'diameterMm',
    input.diameterMm,
    'diameterResolutionMm',
    input.diameterResolutionMm ?? 0.001,
  );
  const budget: BudgetComponent[] = [
    component(
      d.count > 1 ? `diameter (mean of ${d.count})` : 'diameter',
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
        'spread of diameter readings',
        d.value,
        'mm',
        d.uSpread,
        2,
        'standard deviation of the mean s/√n (GUM 4.2.3)',
      ),
    );
  }
  return areaResult(
    circleAreaMm2(d.value),
    budget,
    'No conventional constants enter (π only); the micrometer readings carry the uncertainty. Assumes a round conductor.',
  );
}
