import { describe, expect, it } from 'vitest';
import { identifyMaterial } from './identify-material.js';
import { MATERIALS, type MaterialId } from './materials.js';

/** Readings a 1 m stranded specimen of `areaMm2` of `id` would give at 20 °C (k = 2 %, ASTM B496). */
function specimen(id: MaterialId, areaMm2: number) {
  const m = MATERIALS[id];
  return {
    massG: (m.densityGPerCm3 / 1000) * areaMm2 * 1000 * 1.02,
    lengthMm: 1000,
    resistanceOhm: (m.resistivityOhmMm2PerM * 1.02) / areaMm2,
  };
}

describe('identifyMaterial (REFERENCE §2)', () => {
  it('finds copper by its mass resistivity 0.15328 Ω·g/m² (IACS, NBS Handbook 100)', () => {
    const r = identifyMaterial(specimen('copper', 8.39));
    expect(r.material).toBe('copper');
    expect(r.massResistivity).toBeCloseTo(0.15328, 4);
    expect(r.reason).toMatch(/copper/);
  });

  it.each([
    ['cca15', 'cca', 0.097], // ASTM B566 class 15A, derived (REFERENCE §2)
    ['cca10', 'cca', 0.091], // ASTM B566 class 10A, derived
    ['aluminium', 'aluminium', 0.0765], // IEC 60287-1-1; density from memory
  ] as const)('finds %s as %s (≈ %s Ω·g/m²)', (id, family, product) => {
    const r = identifyMaterial(specimen(id, 21.15));
    expect(r.material).toBe(family);
    expect(r.closestGrade).toBe(id);
    expect(r.massResistivity).toBeCloseTo(product, 3);
  });

  it('does not depend on the cross-section (geometry-free, REFERENCE §2)', () => {
    expect(identifyMaterial(specimen('copper', 2.08)).massResistivity).toBeCloseTo(
      identifyMaterial(specimen('copper', 107.2)).massResistivity as number,
      10,
    );
  });

  it('corrects the resistance to 20 °C (α₂₀ = 0.00393, IACS)', () => {
    const s = specimen('copper', 21.15);
    const warm = { ...s, resistanceOhm: s.resistanceOhm * (1 + 0.00393 * 10), temperatureC: 30 };
    expect(identifyMaterial(warm).massResistivity).toBeCloseTo(0.15328, 4);
  });

  it('uses apparent density with a geometric area (copper 8.89, CCA-15 3.63 g/cm³)', () => {
    const cu = specimen('copper', 21.15);
    const r = identifyMaterial({ massG: cu.massG, lengthMm: 1000, geometricAreaMm2: 21.15 });
    expect(r.material).toBe('copper');
    expect(r.apparentDensity).toBeCloseTo(8.89, 6);
    const cca = specimen('cca15', 21.15);
    expect(
      identifyMaterial({ massG: cca.massG, lengthMm: 1000, geometricAreaMm2: 21.15 })
        .apparentDensity,
    ).toBeCloseTo(3.63, 6);
  });

  it('calls a reading typo inconsistent, with a reason', () => {
    const s = specimen('copper', 8.39);
    const typo = identifyMaterial({ ...s, massG: s.massG * 10 }); // 761 g instead of 76.1 g
    expect(typo.material).toBe('inconsistent');
    expect(typo.reason).toMatch(/typo/);
    // weight fits copper by volume but the resistance says aluminium
    const clash = identifyMaterial({
      ...s,
      resistanceOhm: specimen('aluminium', 8.39).resistanceOhm * (8.89 / 2.705),
      geometricAreaMm2: 8.39,
    });
    expect(clash.material).toBe('inconsistent');
  });

  it('says unknown with too little data', () => {
    const r = identifyMaterial({ massG: 76.1, lengthMm: 1000 });
    expect(r.material).toBe('unknown');
    expect(r.reason).toMatch(/resistance/);
  });
});
