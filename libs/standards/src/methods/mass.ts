import { materialById, type MaterialId } from '../materials.js';
import {
  areaResult,
  component,
  exactConstant,
  type AreaResult,
  type BudgetComponent,
} from '../uncertainty.js';
import {
  optionalTolerance,
  percentText,
  reading,
  requireIncrement,
  STANDARD_STRANDING_INCREMENT,
} from './common.js';

export interface AreaFromMassInput {
  /** Mass of all stripped strands of the specimen, g (ASTM B263). */
  massG: number;
  /** Cut length of the specimen, mm. */
  lengthMm: number;
  material?: MaterialId;
  /** Stranding increment k; 0.02 is ASTM B496's standard 2 %. Use 0 for a solid conductor. */
  strandingIncrement?: number;
  /** Balance resolution, g. Default 0.1 g (issue 3). */
  massResolutionG?: number;
  /** Length rule division, mm. Default 1 mm: ASTM B263 asks for divisions no larger (REFERENCE §3). */
  lengthResolutionMm?: number;
  /** Optional stated accuracy ±a of the balance, g (from its calibration), taken as a/√3. */
  massToleranceG?: number;
  /** Optional stated accuracy ±a of the length rule, mm, taken as a/√3. */
  lengthToleranceMm?: number;
}

/**
 * Cross-section by mass (ASTM B263): A = m / (ρ · L · (1 + k)), ρ the assumed material's
 * density. Density and increment are conventional and treated as exact.
 */
export function areaFromMass(input: AreaFromMassInput): AreaResult {
  const material = materialById(input.material ?? 'copper');
  const k = requireIncrement(input.strandingIncrement ?? STANDARD_STRANDING_INCREMENT);
  const mass = reading('massG', input.massG, 'massResolutionG', input.massResolutionG ?? 0.1);
  const length = reading(
    'lengthMm',
    input.lengthMm,
    'lengthResolutionMm',
    input.lengthResolutionMm ?? 1,
  );
  const uMassTol = optionalTolerance('massToleranceG', input.massToleranceG);
  const uLengthTol = optionalTolerance('lengthToleranceMm', input.lengthToleranceMm);

  const densityGPerMm3 = material.densityGPerCm3 / 1000;
  const areaMm2 = mass.value / (densityGPerMm3 * length.value * (1 + k));

  const budget: BudgetComponent[] = [
    component(
      'mass reading',
      mass.value,
      'g',
      mass.uResolution,
      1,
      'balance resolution δ/√12 (GUM F.2.2.1)',
    ),
    component(
      'cut length',
      length.value,
      'mm',
      length.uResolution,
      -1,
      'rule division δ/√12 (GUM F.2.2.1)',
    ),
  ];
  if (uMassTol > 0) {
    budget.push(
      component(
        'balance accuracy',
        mass.value,
        'g',
        uMassTol,
        1,
        'stated tolerance a/√3 (GUM 4.3.7)',
      ),
    );
  }
  if (uLengthTol > 0) {
    budget.push(
      component(
        'rule accuracy',
        length.value,
        'mm',
        uLengthTol,
        -1,
        'stated tolerance a/√3 (GUM 4.3.7)',
      ),
    );
  }
  budget.push(
    exactConstant(
      `density of ${material.name}`,
      material.densityGPerCm3,
      'g/cm³',
      -1,
      material.sources.density,
    ),
    exactConstant(
      'stranding factor 1 + k',
      1 + k,
      '1',
      -1,
      'ASTM B496 standard increment when k = 0.02',
    ),
  );
  return areaResult(
    areaMm2,
    budget,
    `Density (${material.densityGPerCm3} g/cm³) and stranding increment (${percentText(k)}) are conventional constants treated as exact: the uncertainty covers the readings only.`,
  );
}
