import {
  MATERIALS,
  massResistivity,
  resistanceFactor,
  type Material,
  type MaterialId,
} from './materials.js';
import { requireIncrement, STANDARD_STRANDING_INCREMENT } from './methods/common.js';
import { gramsPerMetre } from './units.js';
import { requirePositive, requireTemperature } from './validate.js';

/** What the readings of a sample say the metal is. */
export const IDENTIFIED_MATERIALS = [
  'copper',
  'cca',
  'aluminium',
  'inconsistent',
  'unknown',
] as const;
export type IdentifiedMaterial = (typeof IDENTIFIED_MATERIALS)[number];

export interface IdentifyMaterialInput {
  massG: number;
  lengthMm: number;
  resistanceOhm?: number;
  temperatureC?: number;
  /** Metal area from the strands or a solid diameter, mm² (not from the mass method). */
  geometricAreaMm2?: number;
  strandingIncrement?: number;
}

export interface MaterialIdentification {
  material: IdentifiedMaterial;
  /** The known grade closest to the readings, when one is within the tolerance. */
  closestGrade?: MaterialId;
  /** (g/m) × (Ω/m) at 20 °C, per strand metre (stranding removed), Ω·g/m². */
  massResistivity?: number;
  /** Mass ÷ geometric volume, g/cm³. */
  apparentDensity?: number;
  reason: string;
}

/**
 * How far a reading may sit from a known metal and still be called that metal: 15 % either
 * way (our own tolerance, no source). It covers reading uncertainty, the stranding increment
 * and grade spread, and still separates copper (0.153) from CCA-15 (0.097) and CCA-10
 * (0.091) from aluminium (0.0765 Ω·g/m²) (REFERENCE §2).
 */
export const IDENTIFICATION_TOLERANCE = 0.15;

/** Grades compared; tinned copper is copper for this purpose (same constants). */
const CANDIDATES: readonly Material[] = [
  MATERIALS.copper,
  MATERIALS.cca15,
  MATERIALS.cca10,
  MATERIALS.aluminium,
];

function nearest(value: number, of: (m: Material) => number): { grade: Material; off: number } {
  let best = { grade: CANDIDATES[0], off: Infinity };
  for (const grade of CANDIDATES) {
    const off = Math.abs(Math.log(value / of(grade)));
    if (off < best.off) best = { grade, off };
  }
  return best;
}

const withinTolerance = (off: number): boolean => off <= Math.log(1 + IDENTIFICATION_TOLERANCE);
const familyName = {
  copper: 'copper',
  cca: 'copper-clad aluminium (CCA)',
  aluminium: 'aluminium',
} as const;

/**
 * Tells copper from CCA and aluminium without trusting the label. With mass and resistance
 * it uses the geometry-free mass-resistivity product (m/L)·(R/L), corrected to 20 °C with
 * each candidate's α₂₀ and divided by (1 + k)² because stranding lengthens both (REFERENCE
 * §2). With mass and a geometric area it uses the apparent density m / (A · L · (1 + k)).
 */
export function identifyMaterial(input: IdentifyMaterialInput): MaterialIdentification {
  const massG = requirePositive('massG', input.massG);
  const lengthMm = requirePositive('lengthMm', input.lengthMm);
  const k = requireIncrement(input.strandingIncrement ?? STANDARD_STRANDING_INCREMENT);
  const t = requireTemperature('temperatureC', input.temperatureC ?? 20);
  const hasR = input.resistanceOhm !== undefined;
  const hasA = input.geometricAreaMm2 !== undefined;
  const resistanceOhm = hasR ? requirePositive('resistanceOhm', input.resistanceOhm) : 0;
  const areaMm2 = hasA ? requirePositive('geometricAreaMm2', input.geometricAreaMm2) : 0;

  if (!hasR && !hasA) {
    return {
      material: 'unknown',
      reason:
        'The weight alone cannot tell the metal. Add a four-wire resistance reading or the strand count and diameter.',
    };
  }
  const result: MaterialIdentification = { material: 'unknown', reason: '' };
  let byProduct: Material | undefined;
  if (hasR) {
    const raw =
      (gramsPerMetre(massG, lengthMm) * (resistanceOhm / (lengthMm / 1000))) / (1 + k) ** 2;
    const best = nearest(raw, (m) => massResistivity(m) * resistanceFactor(m, t));
    result.massResistivity = raw / resistanceFactor(best.grade, t);
    if (!withinTolerance(best.off)) {
      return inconsistent(
        result,
        `weight × resistance gives ${result.massResistivity.toFixed(4)} Ω·g/m²`,
      );
    }
    byProduct = best.grade;
  }
  let byDensity: Material | undefined;
  if (hasA) {
    result.apparentDensity = (massG / (areaMm2 * lengthMm * (1 + k))) * 1000;
    const best = nearest(result.apparentDensity, (m) => m.densityGPerCm3);
    if (!withinTolerance(best.off)) {
      return inconsistent(
        result,
        `weight ÷ volume gives ${result.apparentDensity.toFixed(2)} g/cm³`,
      );
    }
    byDensity = best.grade;
  }
  if (byProduct && byDensity && byProduct.family !== byDensity.family) {
    return inconsistent(
      result,
      `weight × resistance points to ${familyName[byProduct.family]} but weight ÷ volume points to ${familyName[byDensity.family]}`,
    );
  }
  const grade = (byProduct ?? byDensity) as Material;
  result.material = grade.family;
  result.closestGrade = grade.id;
  const how = byProduct ? 'weight times resistance' : 'weight for its size';
  result.reason = `The ${how} matches ${familyName[grade.family]}${grade.family === 'cca' ? ` (closest: ${grade.name})` : ''}.`;
  return result;
}

function inconsistent(result: MaterialIdentification, what: string): MaterialIdentification {
  result.material = 'inconsistent';
  result.reason = `The readings do not match any known conductor metal (${what}). Check the readings for a typo, the length and the strand count, then measure again.`;
  return result;
}
