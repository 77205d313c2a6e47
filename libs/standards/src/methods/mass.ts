import { materialById, type MaterialId } from '../materials.js';
import {
  areaResult,
  exactConstant,
  instrumentComponents,
  type AreaResult,
  type InstrumentAccuracy,
} from '../uncertainty.js';
import {
  checkAccuracy,
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
  /** The balance's stated accuracy and calibration uncertainty, g (instrument register). */
  balance?: InstrumentAccuracy;
  /** The length rule's stated accuracy and calibration uncertainty, mm (instrument register). */
  rule?: InstrumentAccuracy;
}

/**
 * Cross-section by mass (ASTM B263): A = m / (ρ · L · (1 + k)), ρ the assumed material's
 * density. Density and increment are conventional and treated as exact. The balance and the
 * rule each contribute resolution, stated accuracy and calibration (GUM 4.3); the cut length
 * is read at both ends of the specimen.
 */
export function areaFromMass(input: AreaFromMassInput): AreaResult {
  const material = materialById(input.material ?? 'copper');
  const k = requireIncrement(input.strandingIncrement ?? STANDARD_STRANDING_INCREMENT);
  const massResolution = input.massResolutionG ?? 0.1;
  const lengthResolution = input.lengthResolutionMm ?? 1;
  const mass = reading('massG', input.massG, 'massResolutionG', massResolution);
  const length = reading('lengthMm', input.lengthMm, 'lengthResolutionMm', lengthResolution);
  const balance = checkAccuracy('balance', input.balance);
  const rule = checkAccuracy('rule', input.rule);

  const densityGPerMm3 = material.densityGPerCm3 / 1000;
  const areaMm2 = mass.value / (densityGPerMm3 * length.value * (1 + k));

  return areaResult(
    areaMm2,
    [
      ...instrumentComponents('mass', mass.value, 'g', 1, massResolution, balance, {
        resolutionNote: 'balance resolution',
      }),
      ...instrumentComponents('cut length', length.value, 'mm', -1, lengthResolution, rule, {
        readings: 2,
        resolutionNote: 'rule division',
      }),
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
    ],
    `Density (${material.densityGPerCm3} g/cm³) and stranding increment (${percentText(k)}) are conventional constants treated as exact: the uncertainty covers the instruments (resolution, stated accuracy, calibration) and the cut length.`,
  );
}
