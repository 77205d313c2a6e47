import { requireOneOf } from './validate.js';

/** The materials a conductor may be sold as, in the order of `MATERIALS`. */
export const MATERIAL_IDS = ['copper', 'tinned_copper', 'cca10', 'cca15', 'aluminium'] as const;
export type MaterialId = (typeof MATERIAL_IDS)[number];

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
const CCA_ALPHA =
  'derived: copper (α 0.00393, ρ 1/58; IACS) and aluminium 1350 (α 0.00403, ρ 0.028264; IEC 60287-1-1 Table 1) in parallel, by the ASTM B566 copper volume';

/** Annealed copper, 100 % IACS: resistivity 1/58 Ω·mm²/m (IACS, NBS Handbook 100; IEC 60028). */
const COPPER_RESISTIVITY = 1 / 58;
/** Annealed copper α₂₀, per °C (IACS, NBS Handbook 100; IEC 60287-1-1 Table 1). */
const COPPER_ALPHA = 0.00393;
/** Aluminium 1350 resistivity, Ω·mm²/m, and α₂₀, per °C (IEC 60287-1-1 Table 1). */
const ALUMINIUM_RESISTIVITY = 0.028264;
const ALUMINIUM_ALPHA = 0.00403;
/** Tinned soft copper wire over 0.51 to 2.6 mm: at most 0.15940 Ω·g/m² at 20 °C (ASTM B33 Table 2). */
export const TINNED_COPPER_MASS_RESISTIVITY = 0.1594;

/**
 * Temperature coefficient of a copper-clad aluminium wire whose copper is `copperVolume` of
 * its cross-section (ASTM B566: 10 % for class 10A, 15 % for 15A). The cladding and the core
 * carry current side by side, so they are two resistors in parallel: each conducts in
 * proportion to its conductance Gᵢ = Aᵢ/ρᵢ, and the conductance at t is
 * G(t) = Σ Gᵢ / (1 + αᵢ Δt) ≈ Σ Gᵢ (1 − αᵢ Δt), so α = Σ Gᵢ αᵢ / Σ Gᵢ (first order in Δt).
 * Class 10A: G_Cu = 0.10/0.017241 = 5.80, G_Al = 0.90/0.028264 = 31.84 (per mm² of wire),
 * α = (5.80 × 0.00393 + 31.84 × 0.00403) / 37.64 = 0.004015 /°C; class 15A: 0.004008 /°C.
 * Scaling copper's α by the conductivity (0.00393 × 0.63 ≈ 0.0025) understates it: the
 * aluminium core carries most of the current and has the larger α.
 */
export function parallelAlpha(copperVolume: number): number {
  const gCopper = copperVolume / COPPER_RESISTIVITY;
  const gAluminium = (1 - copperVolume) / ALUMINIUM_RESISTIVITY;
  return (gCopper * COPPER_ALPHA + gAluminium * ALUMINIUM_ALPHA) / (gCopper + gAluminium);
}

export const MATERIALS: Readonly<Record<MaterialId, Material>> = Object.freeze({
  copper: {
    id: 'copper',
    name: 'annealed copper',
    family: 'copper',
    densityGPerCm3: 8.89, // IACS, NBS Handbook 100
    resistivityOhmMm2PerM: COPPER_RESISTIVITY, // 0.017241, IACS, NBS Handbook 100; IEC 60028
    alpha20PerC: COPPER_ALPHA, // IACS, NBS Handbook 100; IEC 60287-1-1 Table 1
    sources: { density: IACS, resistivity: IACS, alpha: IACS },
  },
  tinned_copper: {
    id: 'tinned_copper',
    name: 'tinned annealed copper',
    family: 'copper',
    // The tin coat is thin: treated as annealed copper's density (common practice, no source).
    densityGPerCm3: 8.89,
    // ASTM B33 Table 2: tinned soft copper wire over 0.51 to 2.6 mm, mass resistivity at most
    // 0.15940 Ω·g/m² at 20 °C; divided by the density 8.89 g/cm³: 0.017930 Ω·mm²/m (96.2 % IACS).
    resistivityOhmMm2PerM: TINNED_COPPER_MASS_RESISTIVITY / 8.89,
    alpha20PerC: 0.00393, // treated as annealed copper's (common practice, no source)
    sources: {
      density: "treated as annealed copper's (common practice, no source)",
      resistivity:
        'ASTM B33 Table 2: 0.15940 Ω·g/m² max at 20 °C (wire over 0.51 to 2.6 mm) ÷ 8.89 g/cm³',
      alpha: "treated as annealed copper's (common practice, no source)",
    },
  },
  cca10: {
    id: 'cca10',
    name: 'copper-clad aluminium, class 10A',
    family: 'cca',
    densityGPerCm3: 3.32, // ASTM B566 class 10A, maker's data sheet
    resistivityOhmMm2PerM: 0.02741, // max, 62.9 % IACS min (ASTM B566; derived)
    alpha20PerC: parallelAlpha(0.1), // ≈ 0.00401: copper and aluminium in parallel (below)
    sources: { density: B566, resistivity: B566, alpha: CCA_ALPHA },
  },
  cca15: {
    id: 'cca15',
    name: 'copper-clad aluminium, class 15A',
    family: 'cca',
    densityGPerCm3: 3.63, // ASTM B566 class 15A, maker's data sheet
    resistivityOhmMm2PerM: 0.026772, // max, 64.4 % IACS min (ASTM B566; derived)
    alpha20PerC: parallelAlpha(0.15), // ≈ 0.00401: copper and aluminium in parallel (below)
    sources: { density: B566, resistivity: B566, alpha: CCA_ALPHA },
  },
  aluminium: {
    id: 'aluminium',
    name: 'aluminium 1350',
    family: 'aluminium',
    densityGPerCm3: 2.705, // from memory (ASTM B230/B231)
    resistivityOhmMm2PerM: ALUMINIUM_RESISTIVITY, // 61.0 % IACS, IEC 60287-1-1 Table 1
    alpha20PerC: ALUMINIUM_ALPHA, // IEC 60287-1-1 Table 1
    sources: {
      density: 'from memory (ASTM B230/B231)',
      resistivity: 'IEC 60287-1-1 Table 1 (61.0 % IACS)',
      alpha: 'IEC 60287-1-1 Table 1',
    },
  },
});

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
