import { describe, expect, it } from 'vitest';
import { voltageDrop } from './voltage-drop.js';

describe('voltageDrop (V = I · R, REFERENCE §7)', () => {
  it('4 AWG copper, 5 m circuit, 100 A: hand calculation from IACS resistivity', () => {
    // R = 0.017241 Ω·mm²/m × 5 m / 21.15 mm² (IACS; ASTM B258); solid (k = 0)
    const v = voltageDrop({
      areaMm2: 21.15,
      circuitLengthM: 5,
      currentA: 100,
      strandingIncrement: 0,
    });
    expect(v.resistanceOhm).toBeCloseTo(0.0040759, 6);
    expect(v.volts).toBeCloseTo(0.40759, 4);
    // stranded, the default 2 % of ASTM B496
    expect(voltageDrop({ areaMm2: 21.15, circuitLengthM: 5, currentA: 100 }).volts).toBeCloseTo(
      0.40759 * 1.02,
      4,
    );
  });

  it('the 8 AWG hidden in a "4 AWG" jacket drops 2.5 times as much', () => {
    const label = voltageDrop({ areaMm2: 21.15, circuitLengthM: 5, currentA: 100 }).volts;
    const real = voltageDrop({ areaMm2: 8.3923, circuitLengthM: 5, currentA: 100 }).volts;
    expect(real / label).toBeCloseTo(21.15 / 8.3923, 10);
  });

  it('a full-area copper conductor stays inside every IEC 60228 maximum of REFERENCE §4', () => {
    const rows: [number, number, number, number][] = [
      // mm², class 5 plain, class 5 tinned, class 2 plain (Ω/km, IEC 60228)
      [6, 3.3, 3.39, 3.08],
      [10, 1.91, 1.95, 1.83],
      [16, 1.21, 1.24, 1.15],
      [25, 0.78, 0.795, 0.727],
      [35, 0.554, 0.565, 0.524],
      [50, 0.386, 0.393, 0.387],
    ];
    for (const [area, class5, class5Tinned, class2] of rows) {
      const perKm = voltageDrop({ areaMm2: area, circuitLengthM: 1000, currentA: 1 }).resistanceOhm;
      expect(perKm).toBeLessThan(Math.min(class5, class5Tinned, class2));
    }
  });

  it('rises with temperature by α₂₀ (IEC 60287-1-1 Table 1)', () => {
    const cold = voltageDrop({ areaMm2: 21.15, circuitLengthM: 5, currentA: 100 });
    const hot = voltageDrop({ areaMm2: 21.15, circuitLengthM: 5, currentA: 100, temperatureC: 70 });
    expect(hot.volts / cold.volts).toBeCloseTo(1 + 0.00393 * 50, 10);
    const al = voltageDrop({
      areaMm2: 21.15,
      circuitLengthM: 5,
      currentA: 100,
      material: 'aluminium',
    });
    expect(al.volts / cold.volts).toBeCloseTo(0.028264 / (1 / 58), 10);
  });
});
