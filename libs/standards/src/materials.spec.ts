import { describe, expect, it } from 'vitest';
import { StandardsInputError } from './errors.js';
import {
  iec60228CopperFactor,
  MATERIAL_IDS,
  MATERIALS,
  massResistivity,
  materialById,
  parallelAlpha,
  resistanceFactor,
} from './materials.js';

describe('materials (REFERENCE §2)', () => {
  it('holds the published constants with their sources', () => {
    expect(MATERIALS.copper.densityGPerCm3).toBe(8.89); // IACS, NBS Handbook 100
    expect(MATERIALS.copper.resistivityOhmMm2PerM).toBeCloseTo(0.017241, 6); // 1/58, IACS; IEC 60028
    expect(MATERIALS.copper.alpha20PerC).toBe(0.00393); // IACS; IEC 60287-1-1 Table 1
    expect(MATERIALS.aluminium.resistivityOhmMm2PerM).toBe(0.028264); // IEC 60287-1-1 Table 1
    expect(MATERIALS.aluminium.alpha20PerC).toBe(0.00403); // IEC 60287-1-1 Table 1
    expect(MATERIALS.aluminium.densityGPerCm3).toBe(2.705); // from memory (ASTM B230/B231)
    expect(MATERIALS.cca10.densityGPerCm3).toBe(3.32); // ASTM B566 class 10A, maker's data sheet
    expect(MATERIALS.cca15.resistivityOhmMm2PerM).toBe(0.026772); // ASTM B566 class 15A, derived
    expect(MATERIALS.aluminium.sources.density).toContain('from memory');
    expect(MATERIALS.tinned_copper.sources.density).toContain('common practice, no source');
    expect(MATERIAL_IDS).toEqual(['copper', 'tinned_copper', 'cca10', 'cca15', 'aluminium']);
  });

  it('resistivities match their % IACS (IACS = 1/58 Ω·mm²/m, NBS Handbook 100)', () => {
    expect(1 / 58 / MATERIALS.aluminium.resistivityOhmMm2PerM).toBeCloseTo(0.61, 3); // 61.0 % IACS
    expect(1 / 58 / MATERIALS.cca10.resistivityOhmMm2PerM).toBeCloseTo(0.629, 3); // 62.9 % IACS
    expect(1 / 58 / MATERIALS.cca15.resistivityOhmMm2PerM).toBeCloseTo(0.644, 3); // 64.4 % IACS
  });

  it('mass resistivity: copper 0.15328 Ω·g/m² (IACS, NBS Handbook 100); others derived (REFERENCE §2)', () => {
    expect(massResistivity(MATERIALS.copper)).toBeCloseTo(0.15328, 4);
    expect(massResistivity(MATERIALS.cca15)).toBeCloseTo(0.097, 3);
    expect(massResistivity(MATERIALS.cca10)).toBeCloseTo(0.091, 3);
    expect(massResistivity(MATERIALS.aluminium)).toBeCloseTo(0.0765, 3);
  });

  it('temperature factors: IEC 60228 k_t is 0.980 at 25 °C and agrees with α₂₀ = 0.00393', () => {
    // IEC 60228 Annex B quotes 0.980 at 25 °C; the formula gives 254.5/259.5 = 0.98073.
    expect(Math.abs(iec60228CopperFactor(25) - 0.98)).toBeLessThan(0.001);
    expect(iec60228CopperFactor(25)).toBeCloseTo(254.5 / 259.5, 12);
    expect(iec60228CopperFactor(20)).toBeCloseTo(1, 12);
    for (let t = 0; t <= 60; t += 5) {
      // R₂₀ = R_t / (1 + α₂₀(t − 20)) (IEC 60287-1-1) against R₂₀ = R_t · k_t (IEC 60228)
      expect(1 / resistanceFactor(MATERIALS.copper, t)).toBeCloseTo(iec60228CopperFactor(t), 3);
    }
  });

  it('refuses unknown materials with the field named', () => {
    expect(() => materialById('brass')).toThrow(StandardsInputError);
    expect(() => materialById('gold', 'claimedMaterial')).toThrow(/claimedMaterial/);
  });
});

describe('tinned copper and CCA (issue 13)', () => {
  it('tinned copper has its own resistivity: ASTM B33 Table 2, 0.15940 Ω·g/m² ÷ 8.89 g/cm³', () => {
    expect(MATERIALS.tinned_copper.resistivityOhmMm2PerM).toBeCloseTo(0.01793, 5); // ASTM B33 Table 2
    expect(massResistivity(MATERIALS.tinned_copper)).toBeCloseTo(0.1594, 6); // ASTM B33 Table 2
    expect(MATERIALS.tinned_copper.sources.resistivity).toMatch(/ASTM B33 Table 2/);
    // 96.2 % IACS: above plain copper's 1/58 (IACS, NBS Handbook 100)
    expect(1 / 58 / MATERIALS.tinned_copper.resistivityOhmMm2PerM).toBeCloseTo(0.962, 3);
  });

  it('CCA α₂₀ comes from its two metals in parallel, ≈ 0.0040 /°C (derivation in materials.ts)', () => {
    // G_Cu = 0.10 × 58 = 5.80, G_Al = 0.90 / 0.028264 = 31.84; α = Σ Gα / Σ G
    const gCu = 0.1 * 58;
    const gAl = 0.9 / 0.028264; // IEC 60287-1-1 Table 1
    expect(MATERIALS.cca10.alpha20PerC).toBeCloseTo(
      (gCu * 0.00393 + gAl * 0.00403) / (gCu + gAl),
      12,
    );
    expect(MATERIALS.cca10.alpha20PerC).toBeCloseTo(0.004015, 6);
    expect(MATERIALS.cca15.alpha20PerC).toBeCloseTo(0.004008, 6);
    // between its metals' own (0.00393 copper, 0.00403 aluminium; IACS, IEC 60287-1-1)
    expect(parallelAlpha(0)).toBeCloseTo(0.00403, 12);
    expect(parallelAlpha(1)).toBeCloseTo(0.00393, 12);
    expect(MATERIALS.cca15.sources.alpha).toMatch(/in parallel/);
  });
});
