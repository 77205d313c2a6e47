import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import {
  circleAreaMm2,
  cmilToMm2,
  gPerMToLbPerKft,
  gramsPerMetre,
  inToMm,
  lbPerKftToGPerM,
  milToMm,
  MM2_PER_CMIL,
  mm2ToCmil,
  mmToIn,
  mmToMil,
  ohmPerKftToOhmPerKm,
  ohmPerKm,
  ohmPerKmToOhmPerKft,
} from './units.js';

describe('unit conversions', () => {
  it('1 circular mil is 5.067 075 × 10⁻⁴ mm² (REFERENCE §1; ASTM B258)', () => {
    expect(MM2_PER_CMIL).toBeCloseTo(5.067075e-4, 10);
    expect(cmilToMm2(41740)).toBeCloseTo(21.15, 2); // 4 AWG, ASTM B258 rules; NEC Ch. 9 Table 8
    expect(mm2ToCmil(107.2)).toBeCloseTo(211600, -2); // 4/0 AWG, same source
  });

  it('agrees with js-quantities for inch, mil and circular mil', () => {
    for (const x of [0.001, 0.2043, 1, 12.5]) {
      expect(inToMm(x)).toBeCloseTo(Qty(x, 'in').to('mm').scalar, 12);
      expect(mmToIn(x)).toBeCloseTo(Qty(x, 'mm').to('in').scalar, 12);
      expect(milToMm(x)).toBeCloseTo(Qty(x, 'mil').to('mm').scalar, 12);
      expect(mmToMil(x)).toBeCloseTo(Qty(x, 'mm').to('mil').scalar, 9);
    }
    // A circular mil is π/4 of a square mil (ASTM B258); js-quantities knows the square mil.
    const squareMilInMm2 = Qty(1, 'mil^2').to('mm^2').scalar;
    expect(cmilToMm2(1)).toBeCloseTo((Math.PI / 4) * squareMilInMm2, 15);
    expect(cmilToMm2(16510) / ((Math.PI / 4) * Qty(16510, 'mil^2').to('mm^2').scalar)).toBeCloseTo(
      1,
      12,
    );
  });

  it('agrees with js-quantities for g/m and lb/1000 ft', () => {
    expect(gramsPerMetre(76.1, 1000)).toBe(76.1); // 4 AWG check sample of issue 3
    expect(gramsPerMetre(38.05, 500)).toBeCloseTo(76.1, 12);
    for (const gPerM of [1, 76.1, 187.6]) {
      const lbPerKft = Qty(gPerM, 'g/m').to('lb/ft').scalar * 1000;
      expect(gPerMToLbPerKft(gPerM)).toBeCloseTo(lbPerKft, 10);
      expect(lbPerKftToGPerM(gPerMToLbPerKft(gPerM))).toBeCloseTo(gPerM, 12);
    }
    expect(Qty(1, 'kg/km').to('g/m').scalar).toBeCloseTo(1, 12); // g/m is kg/km
  });

  it('agrees with js-quantities for Ω/km and Ω/1000 ft', () => {
    expect(ohmPerKm(0.00078, 1000)).toBeCloseTo(0.78, 12); // IEC 60228 class 5, 25 mm²
    expect(ohmPerKm(0.00078, 1000)).toBeCloseTo(Qty(0.00078, 'ohm/m').to('ohm/km').scalar, 12);
    for (const ohmKm of [0.386, 0.78, 3.3]) {
      const perKft = Qty(ohmKm, 'ohm/km').to('ohm/ft').scalar * 1000;
      expect(ohmPerKmToOhmPerKft(ohmKm)).toBeCloseTo(perKft, 12);
      expect(ohmPerKftToOhmPerKm(ohmPerKmToOhmPerKft(ohmKm))).toBeCloseTo(ohmKm, 12);
    }
  });

  it('circle area is π d²/4 (geometry)', () => {
    expect(circleAreaMm2(2)).toBeCloseTo(Math.PI, 14);
    expect(circleAreaMm2(inToMm(0.2043))).toBeCloseTo(21.15, 2); // 4 AWG, ASTM B258 rules
  });
});
