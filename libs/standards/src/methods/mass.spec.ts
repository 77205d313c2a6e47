import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MATERIAL_IDS, MATERIALS } from '../materials.js';
import { areaFromMass } from './mass.js';

describe('areaFromMass (ASTM B263: A = m / (ρ · L · (1 + k)))', () => {
  it('finds 8.39 mm² in 76.1 g of copper over 1 m (issue 3 check value)', () => {
    const r = areaFromMass({ massG: 76.1, lengthMm: 1000 });
    // 76.1 g / (8.89 g/cm³ · 1000 mm · 1.02) = 8.3923 mm² (copper 8.89, IACS; 2 %, ASTM B496)
    expect(r.areaMm2).toBeCloseTo(8.3923, 4);
    // u: (0.1/√12 / 76.1)² + (√2 · 1/√12 / 1000)² → 5.573e-4 relative (GUM F.2.2.1, §5.1.6;
    // the cut length is read at both ends of the specimen)
    expect(r.uMm2 / r.areaMm2).toBeCloseTo(5.573e-4, 6);
    expect(r.UMm2).toBeCloseTo(2 * r.uMm2, 15); // k = 2 (REFERENCE §5)
    expect(r.coverageFactor).toBe(2);
  });

  it('lists the readings and says the constants are exact', () => {
    const r = areaFromMass({ massG: 76.1, lengthMm: 1000 });
    expect(r.budget.map((c) => c.name)).toEqual([
      'mass: resolution',
      'cut length: resolution',
      'density of annealed copper',
      'stranding factor 1 + k',
    ]);
    const density = r.budget[2];
    expect(density.standardUncertainty).toBe(0);
    expect(density.note).toMatch(/treated as exact/);
    expect(r.note).toMatch(/treated as exact/);
    expect(r.budget[0].standardUncertainty).toBeCloseTo(0.1 / Math.sqrt(12), 12);
  });

  it('adds stated accuracy a/√3 (GUM 4.3.7) and calibration U/2 (GUM 6.2) of each instrument', () => {
    const plain = areaFromMass({ massG: 76.1, lengthMm: 1000 });
    // balance accurate to 0.1 % of reading (ASTM B263, REFERENCE §3) + 0.02 g: ±0.0961 g;
    // certificate U = 0.05 g (k = 2); rule calibrated to U = 0.5 mm
    const full = areaFromMass({
      massG: 76.1,
      lengthMm: 1000,
      balance: {
        accuracyPercentOfReading: 0.1,
        accuracyAbsolute: 0.02,
        calibrationUncertainty: 0.05,
      },
      rule: { calibrationUncertainty: 0.5 },
    });
    const line = (name: string) => full.budget.find((c) => c.name === name)?.standardUncertainty;
    expect(line('mass: stated accuracy')).toBeCloseTo(0.0961 / Math.sqrt(3), 12);
    expect(line('mass: calibration')).toBeCloseTo(0.025, 12);
    expect(line('cut length: calibration')).toBeCloseTo(0.25, 12);
    expect(line('cut length: resolution')).toBeCloseTo(Math.sqrt(2) / Math.sqrt(12), 12);
    // every line enters in quadrature (GUM 5.1.6)
    const rel = Math.sqrt(
      (0.1 / Math.sqrt(12) / 76.1) ** 2 +
        (0.0961 / Math.sqrt(3) / 76.1) ** 2 +
        (0.025 / 76.1) ** 2 +
        (Math.sqrt(2 / 12) / 1000) ** 2 +
        (0.25 / 1000) ** 2,
    );
    expect(full.uMm2 / full.areaMm2).toBeCloseTo(rel, 12);
    expect(full.uMm2).toBeGreaterThan(plain.uMm2);
    expect(full.coverageFactor).toBe(2); // Type B only: ν = ∞, k = 2 (GUM G.4.1)
  });

  it('inverts the mass a known area would have (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 250, noNaN: true }),
        fc.double({ min: 50, max: 5000, noNaN: true }),
        fc.constantFrom(...MATERIAL_IDS),
        fc.double({ min: 0, max: 0.1, noNaN: true }),
        (areaMm2, lengthMm, material, k) => {
          const massG = (MATERIALS[material].densityGPerCm3 / 1000) * areaMm2 * lengthMm * (1 + k);
          const r = areaFromMass({ massG, lengthMm, material, strandingIncrement: k });
          expect(r.areaMm2 / areaMm2).toBeCloseTo(1, 10);
        },
      ),
    );
  });

  it('uncertainty is never negative and grows with coarser instruments (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 500, noNaN: true }),
        fc.double({ min: 100, max: 3000, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 1.01, max: 10, noNaN: true }),
        (massG, lengthMm, resolution, coarser) => {
          const fine = areaFromMass({
            massG,
            lengthMm,
            massResolutionG: resolution,
            lengthResolutionMm: resolution,
          });
          const coarse = areaFromMass({
            massG,
            lengthMm,
            massResolutionG: resolution * coarser,
            lengthResolutionMm: resolution * coarser,
          });
          expect(fine.uMm2).toBeGreaterThanOrEqual(0);
          expect(coarse.uMm2).toBeGreaterThanOrEqual(fine.uMm2);
          if (resolution > 1e-9) expect(coarse.uMm2).toBeGreaterThan(fine.uMm2);
        },
      ),
    );
  });

  it('U shrinks as 1/L for a longer specimen of the same cable (assumption of assessSample)', () => {
    const short = areaFromMass({ massG: 76.1 * 0.3, lengthMm: 300 });
    const long = areaFromMass({ massG: 76.1 * 1.2, lengthMm: 1200 });
    expect(long.areaMm2).toBeCloseTo(short.areaMm2, 10);
    expect(long.UMm2 * 1200).toBeCloseTo(short.UMm2 * 300, 10);
  });
});
