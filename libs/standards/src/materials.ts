import { requireOneOf } from './validate.js';

export type MaterialId = 'copper' | 'tinned_copper' | 'cca10' | 'cca15' | 'aluminium';

/** What a measurement can tell apart: copper (plain or tinned), CCA, aluminium. */
export type MaterialFamily = 'copper' | 'cca' | 'aluminium';

export interface Material {
  id: MaterialId;
  name: string;
  family: MaterialFamily;
  /** Density at 20 °C, g/cm³. */
  densityGPerCm3: number;
  /** Resistivity at 20 °C, Ω·mm²/m. */
  resistivityOhmMm2PerM: number;
  /** Temperature coefficient of resistance at 20 °C, per °C. */
  alpha20PerC: number;
  sources: { density: string; resistivity: string; alpha: string };
}

const IACS = 'IACS, NBS Handbook 100 (1966); IEC 60028; IEC 60287-1-1 Table 1';
const B566 = "ASTM B566 classes; figures from a maker's B566 data sheet; resistivity derived";
const B566_ALPHA = '≈ 0.00393 × conductivity fraction (REFERENCE §2, same source as ASTM B566 row)';

/** Annealed copper, 100 % IACS: resistivity 1/58 Ω·mm²/m (IACS, NBS Handbook 100; IEC 60028). */
const COPPER_RESISTIVITY = 1 / 58;

export const MATERIALS: Readonly<Record<MaterialId, Material>> = Object.freeze({
  copper: {
    id: 'copper',
    name: 'annealed copper',
    family: 'copper',
    densityGPerCm3: 8.89, // IACS, NBS Handbook 100
    resistivityOhmMm2PerM: COPPER_RESISTIVITY, // 0.017241, IACS, NBS Handbook 100; IEC 60028
    alpha20PerC: 0.00393, // IACS, NBS Handbook 100; IEC 60287-1-1 Table 1
    sources: { density: IACS, resistivity: IACS, alpha: IACS },
  },
  tinned_copper: {
    id: 'tinned_copper',
    name: 'tinned annealed copper',
    family: 'copper',
    // The tin coat is thin: treated as annealed copper's density (common practice, no source).
    densityGPerCm3: 8.89,
    // Treated as annealed copper's. IEC 60228 Table 3 allows tinned class 5 conductors about
    // 2–3 % more resistance than plain ones (e.g. 25 mm²: 0.795 against 0.780 Ω/km).
    resistivityOhmMm2PerM: COPPER_RESISTIVITY,
    alpha20PerC: 0.00393, // treated as annealed copper's (common practice, no source)
    sources: {
      density: "treated as annealed copper's (common practice, no source)",
      resistivity:
        "treated as annealed copper's (common practice, no source); IEC 60228 tinned class 5 limits are 2–3 % higher",
      alpha: "treated as annealed copper's (common practice, no source)",
    },
  },
  cca10: {
    id: 'cca10',
    name: 'copper-clad aluminium, class 10A',
    family: 'cca',
    densityGPerCm3: 3.32, // ASTM B566 class 10A, maker's data sheet
    resistivityOhmMm2PerM: 0.02741, // max, 62.9 % IACS min (ASTM B566; derived)
    alpha20PerC: 0.00393 * 0.629, // REFERENCE §2: 0.00393 × conductivity fraction
    sources: { density: B566, resistivity: B566, alpha: B566_ALPHA },
  },
  cca15: {
    id: 'cca15',
    name: 'copper-clad aluminium, class 15A',
    family: 'cca',
    densityGPerCm3: 3.63, // ASTM B566 class 15A, maker's data sheet
    resistivityOhmMm2PerM: 0.026772, // max, 64.4 % IACS min (ASTM B566; derived)
    alpha20PerC: 0.00393 * 0.644, // REFERENCE §2: 0.00393 × conductivity fraction
    sources: { density: B566, resistivity: B566, alpha: B566_ALPHA },
  },
  aluminium: {
    id: 'aluminium',
    name: 'aluminium 1350',
    family: 'aluminium',
    densityGPerCm3: 2.705, // from memory (ASTM B230/B231)
    resistivityOhmMm2PerM: 0.028264, // 61.0 % IACS, IEC 60287-1-1 Table 1
    alpha20PerC: 0.00403, // IEC 60287-1-1 Table 1
    sources: {
      density: 'from memory (ASTM B230/B231)',
      resistivity: 'IEC 60287-1-1 Table 1 (61.0 % IACS)',
      alpha: 'IEC 60287-1-1 Table 1',
    },
  },
});

export const MATERIAL_IDS: readonly MaterialId[] = Object.freeze(
  Object.keys(MATERIALS) as MaterialId[],
);

/**
 * Mass resistivity at 20 °C, Ω·g/m²: density × resistivity. For a conductor it equals
 * (g per metre) × (Ω per metre) whatever its cross-section (REFERENCE §2).
 * Copper: 0.15328 Ω·g/m² (IACS, NBS Handbook 100).
 */
export function massResistivity(material: Material): number {
  return material.densityGPerCm3 * material.resistivityOhmMm2PerM;
}

/**
 * Resistance factor R_t / R₂₀ = 1 + α₂₀ (t − 20) (REFERENCE §2; IEC 60287-1-1).
 */
export function resistanceFactor(material: Material, temperatureC: number): number {
  return 1 + material.alpha20PerC * (temperatureC - 20);
}

/**
 * IEC 60228 Annex B temperature correction for copper, to 20 °C: k_t = 254.5 / (234.5 + t)
 * (0.980 at 25 °C). R₂₀ = R_t × k_t.
 */
export function iec60228CopperFactor(temperatureC: number): number {
  return 254.5 / (234.5 + temperatureC);
}

/** The material `id`, or `StandardsInputError(field)` when it is not one we know. */
export function materialById(id: unknown, field = 'material'): Material {
  return MATERIALS[requireOneOf(field, id, MATERIAL_IDS)];
}
