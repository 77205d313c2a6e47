import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { areaFromStrands } from './strands.js';

describe('areaFromStrands (A = n · π d² / 4, REFERENCE §3)', () => {
  it('420 strands of 30 AWG give about 4 AWG (class K table, from a maker; check before relying on it)', () => {
    // 30 AWG = 0.0100 in = 0.254 mm (ASTM B258 rule; ASTM B174 class K strand, REFERENCE §3)
    const r = areaFromStrands({ count: 420, strandDiameterMm: 0.254 });
    expect(r.areaMm2).toBeCloseTo(420 * (Math.PI / 4) * 0.254 ** 2, 10);
    expect(r.areaMm2 / 21.15).toBeCloseTo(1.0, 1); // 4 AWG 21.15 mm² (ASTM B258)
  });

  it('a 1 % error in d is a 2 % error in A (REFERENCE §3)', () => {
    const a = areaFromStrands({ count: 7, strandDiameterMm: 1 }).areaMm2;
    const b = areaFromStrands({ count: 7, strandDiameterMm: 1.01 }).areaMm2;
    expect(b / a - 1).toBeCloseTo(0.0201, 4);
  });

  it('averages several readings and adds their spread (common practice; GUM 4.2.3)', () => {
    const r = areaFromStrands({ count: 168, strandDiameterMm: [0.253, 0.254, 0.255] });
    expect(r.budget[0].value).toBeCloseTo(0.254, 12);
    const spread = r.budget.find((c) => c.name === 'spread of strand diameters');
    expect(spread?.standardUncertainty).toBeCloseTo(0.001 / Math.sqrt(3), 12); // s = 0.001, n = 3
    expect(spread?.degreesOfFreedom).toBe(2); // ν = n − 1 (GUM G.3.3)
    // diameter sensitivity 2: u_rel(A)² = 4 (u_res² + u_spread²) / d²
    const uRes = 0.001 / Math.sqrt(12);
    const uSpread = 0.001 / Math.sqrt(3);
    const expected = (2 * Math.sqrt(uRes ** 2 + uSpread ** 2)) / 0.254;
    expect(r.uMm2 / r.areaMm2).toBeCloseTo(expected, 12);
    // Welch–Satterthwaite (GUM G.4.1): ν_eff = u⁴ / (u_spread⁴ / 2) = 2 · (1 + 1/4)² = 3.125
    expect(r.effectiveDegreesOfFreedom).toBeCloseTo(3.125, 10);
    expect(r.coverageFactor).toBe(3.31); // GUM Table G.2, ν = 3, p = 95.45 %
    expect(r.UMm2).toBeCloseTo(3.31 * r.uMm2, 12);
  });

  it('takes 1 to 10 strand readings and recommends three (issue 13)', () => {
    const diameters = Array.from({ length: 11 }, () => 0.254);
    expect(() => areaFromStrands({ count: 7, strandDiameterMm: diameters })).toThrow(/1 to 10/);
    expect(areaFromStrands({ count: 7, strandDiameterMm: [0.25, 0.26] }).note).toMatch(
      /three or more are recommended/,
    );
  });

  it('uncertainty is never negative and grows with a coarser micrometer (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 2000 }),
        fc.double({ min: 0.05, max: 3, noNaN: true }),
        fc.double({ min: 1e-5, max: 0.01, noNaN: true }),
        (count, d, res) => {
          const fine = areaFromStrands({ count, strandDiameterMm: d, diameterResolutionMm: res });
          const coarse = areaFromStrands({
            count,
            strandDiameterMm: d,
            diameterResolutionMm: res * 2,
          });
          expect(fine.uMm2).toBeGreaterThan(0);
          expect(coarse.uMm2).toBeCloseTo(2 * fine.uMm2, 10);
        },
      ),
    );
  });
});
