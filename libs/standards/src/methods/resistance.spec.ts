import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { iec60228CopperFactor, MATERIALS } from '../materials.js';
import { areaFromResistance } from './resistance.js';

describe('areaFromResistance (A = ρ₂₀ · L · (1 + k) / R₂₀, REFERENCE §2)', () => {
  it('gives back 4 AWG from the resistance a 4 AWG copper cable has (ASTM B258; IACS)', () => {
    const resistanceOhm = (MATERIALS.copper.resistivityOhmMm2PerM * 1 * 1.02) / 21.15; // 1 m, k = 2 %
    expect(resistanceOhm).toBeCloseTo(0.000831, 6);
    const r = areaFromResistance({ resistanceOhm, lengthMm: 1000 });
    expect(r.areaMm2).toBeCloseTo(21.15, 8);
  });

  it('corrects to 20 °C: at 25 °C it matches IEC 60228 k_t = 0.980', () => {
    const at20 = areaFromResistance({ resistanceOhm: 0.001, lengthMm: 1000 });
    const at25 = areaFromResistance({
      resistanceOhm: 0.001 / iec60228CopperFactor(25),
      lengthMm: 1000,
      temperatureC: 25,
    });
    expect(at25.areaMm2 / at20.areaMm2).toBeCloseTo(1, 3);
  });

  it('a 25 mm² class 5 conductor at its IEC 60228 limit (0.780 Ω/km) has ≥ 22 mm² copper-equivalent', () => {
    const r = areaFromResistance({ resistanceOhm: 0.00078, lengthMm: 1000, strandingIncrement: 0 });
    expect(r.areaMm2).toBeCloseTo(0.017241 / 0.00078, 3); // 22.10 mm², IACS resistivity
    expect(r.note).toMatch(/copper-equivalent/);
  });

  it('budgets the resistance reading, length and temperature; constants exact', () => {
    const r = areaFromResistance({ resistanceOhm: 0.000831, lengthMm: 1000, temperatureC: 23 });
    expect(r.budget[0].standardUncertainty).toBeCloseTo(1e-6 / Math.sqrt(12), 15); // GUM F.2.2.1
    expect(r.budget[2].standardUncertainty).toBeCloseTo((0.00393 * 0.1) / Math.sqrt(12), 15);
    expect(r.budget.filter((c) => c.note.includes('treated as exact'))).toHaveLength(3);
  });

  it('uncertainty is never negative and grows with a coarser meter (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-5, max: 1, noNaN: true }),
        fc.double({ min: 100, max: 5000, noNaN: true }),
        fc.double({ min: 1e-7, max: 1e-4, noNaN: true }),
        (resistanceOhm, lengthMm, res) => {
          const fine = areaFromResistance({
            resistanceOhm,
            lengthMm,
            resistanceResolutionOhm: res,
          });
          const coarse = areaFromResistance({
            resistanceOhm,
            lengthMm,
            resistanceResolutionOhm: res * 3,
          });
          expect(fine.uMm2).toBeGreaterThan(0);
          expect(coarse.uMm2).toBeGreaterThan(fine.uMm2);
        },
      ),
    );
  });
});
