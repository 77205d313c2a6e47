import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  AWG_MAX,
  AWG_MIN,
  AWG_SIZES,
  awgDiameterInExact,
  awgGauge,
  roundSignificant,
} from './awg.js';

// REFERENCE §1 table: ASTM B258 rules; NEC Chapter 9 Table 8.
const B258 = [
  { n: -3, label: '4/0 AWG', in: 0.46, mm: 11.68, cmil: 211600, mm2: 107.2 },
  { n: 0, label: '1/0 AWG', in: 0.3249, mm: 8.252, cmil: 105600, mm2: 53.49 },
  { n: 4, label: '4 AWG', in: 0.2043, mm: 5.189, cmil: 41740, mm2: 21.15 },
  { n: 8, label: '8 AWG', in: 0.1285, mm: 3.264, cmil: 16510, mm2: 8.367 },
  { n: 10, label: '10 AWG', in: 0.1019, mm: 2.588, cmil: 10380, mm2: 5.261 },
  { n: 14, label: '14 AWG', in: 0.0641, mm: 1.628, cmil: 4110, mm2: 2.08 },
  { n: 18, label: '18 AWG', in: 0.0403, mm: 1.024, cmil: 1620, mm2: 0.823 },
];

describe('AWG geometry (ASTM B258)', () => {
  it.each(B258)('$label matches the ASTM B258 / NEC Ch. 9 Table 8 row', (row) => {
    const g = awgGauge(row.n);
    expect(g.label).toBe(row.label);
    expect(g.nominalDiameterIn).toBe(row.in);
    expect(g.nominalDiameterMm).toBe(row.mm);
    expect(g.nominalAreaCmil).toBe(row.cmil);
    expect(g.nominalAreaMm2).toBe(row.mm2);
  });

  it('follows B258 rounding, not the unrounded diameter (REFERENCE §1)', () => {
    // Unrounded 8 AWG: 0.128 49 in → 16 510 cmil → 8.366 mm²; B258 rounds d first: 8.367.
    const exact = awgDiameterInExact(8) * 1000;
    expect(roundSignificant(exact * exact * 5.067075e-4, 4)).toBe(8.366); // unrounded route
    expect(awgGauge(8).nominalAreaMm2).toBe(8.367); // ASTM B258 route, REFERENCE §1 table
  });

  it('uses d = 0.005 in × 92^((36 − n)/39) (ASTM B258)', () => {
    expect(awgDiameterInExact(36)).toBeCloseTo(0.005, 12); // 36 AWG is 0.005 in by definition
    expect(awgDiameterInExact(-3)).toBeCloseTo(0.46, 12); // 4/0 is 0.4600 in by definition
    // each step changes d by 92^(1/39) ≈ 1.1229 and the area by about 1.261 (REFERENCE §1)
    expect(awgDiameterInExact(3) / awgDiameterInExact(4)).toBeCloseTo(1.1229, 4);
    expect((awgDiameterInExact(3) / awgDiameterInExact(4)) ** 2).toBeCloseTo(1.261, 3);
  });

  it('tabulates 4/0 … 40 AWG', () => {
    expect(AWG_SIZES).toHaveLength(AWG_MAX - AWG_MIN + 1);
    expect(AWG_SIZES[0].label).toBe('4/0 AWG');
    expect(AWG_SIZES.at(-1)?.label).toBe('40 AWG');
    expect(AWG_SIZES.at(-1)?.nominalDiameterIn).toBe(0.0031); // 40 AWG, B258 rounding rule (from memory: 3.1 mil)
  });

  it('areas strictly decrease as the AWG number rises (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: AWG_MIN, max: AWG_MAX - 1 }), (n) => {
        expect(awgGauge(n + 1).nominalAreaMm2).toBeLessThan(awgGauge(n).nominalAreaMm2);
        expect(awgGauge(n + 1).nominalAreaCmil).toBeLessThan(awgGauge(n).nominalAreaCmil as number);
        expect(awgDiameterInExact(n + 1)).toBeLessThan(awgDiameterInExact(n));
      }),
    );
  });

  it('rounds mm² to within half a unit of its last figure, from the rounded diameter (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: AWG_MIN, max: AWG_MAX }), (n) => {
        const g = awgGauge(n);
        const squareMil = ((g.nominalDiameterIn as number) * 1000) ** 2;
        // as many figures as the diameter has at 0.0001 in, at most 4 (ASTM B258)
        const figures = Math.min(
          4,
          String(Math.round((g.nominalDiameterIn as number) * 10_000)).length,
        );
        const halfUnit = 0.5 * 10 ** (Math.floor(Math.log10(g.nominalAreaMm2)) + 1 - figures);
        expect(Math.abs(g.nominalAreaMm2 - squareMil * 5.067075e-4)).toBeLessThanOrEqual(
          halfUnit * 1.0000001,
        );
      }),
    );
  });
});
