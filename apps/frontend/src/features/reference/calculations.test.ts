import { describe, expect, it } from 'vitest';
import {
  NOMINAL_SYSTEM_V,
  calcAreaFromMass,
  calcAreaFromResistance,
  calcAreaFromStrands,
  calcVoltageDrop,
  readNumbers,
} from '@/features/reference/calculations';

const drop = {
  system: 'metric' as const,
  label: '4 AWG',
  measuredArea: '',
  measuredMaterial: 'copper' as const,
  powerLength: '5',
  groundLength: '5',
  currentA: '100',
  temperatureC: '20',
};

describe('voltage drop of a run', () => {
  it('counts power and ground and compares labelled with measured', () => {
    const calc = calcVoltageDrop({ ...drop, measuredArea: '8.367' });
    if (!calc.ok) throw new Error(calc.message);
    // Hand check: 4 AWG = 21.15 mm² (REFERENCE §1, ASTM B258); copper 1/58 Ω·mm²/m
    // (REFERENCE §2, IACS); stranding 2 % (ASTM B496). R/m = 0.017241 × 1.02 / 21.15
    // = 8.3150e-4 Ω/m; 10 m of circuit at 100 A → 0.8315 V, 6.60 % of 12.6 V.
    expect(calc.value.circuitLengthM).toBe(10);
    expect(calc.value.labelled.areaMm2).toBe(21.15);
    expect(calc.value.labelled.resistancePerMetreOhm).toBeCloseTo(8.315e-4, 7);
    expect(calc.value.labelled.volts).toBeCloseTo(0.8315, 4);
    expect(calc.value.labelled.fraction * 100).toBeCloseTo(6.6, 2);
    // A "4 AWG" that measures like 8 AWG (8.367 mm², REFERENCE §1): 2.102 V.
    expect(calc.value.measured?.volts).toBeCloseTo((0.017241 * 1.02 * 10 * 100) / 8.367, 3);
  });

  it('uses 12.6 V as the nominal system voltage (common practice, no source)', () => {
    expect(NOMINAL_SYSTEM_V).toBe(12.6);
  });

  it('reads lengths in feet and areas in circular mils under the imperial preference', () => {
    const metric = calcVoltageDrop({ ...drop, measuredArea: '8.367' });
    // 16.4042 ft = 5 m (0.3048 m/ft, exact); 16 510 cmil = 8.367 mm² (REFERENCE §1).
    const imperial = calcVoltageDrop({
      ...drop,
      system: 'imperial',
      powerLength: String(5 / 0.3048),
      groundLength: String(5 / 0.3048),
      measuredArea: '16510',
    });
    if (!metric.ok || !imperial.ok) throw new Error('expected results');
    expect(imperial.value.circuitLengthM).toBeCloseTo(10, 9);
    expect(imperial.value.measured?.volts).toBeCloseTo(metric.value.measured?.volts ?? 0, 3);
  });

  it('names the field that is wrong', () => {
    expect(calcVoltageDrop({ ...drop, label: '4 SAE' })).toMatchObject({
      ok: false,
      field: 'label',
    });
    expect(calcVoltageDrop({ ...drop, currentA: 'lots' })).toMatchObject({
      ok: false,
      field: 'currentA',
    });
    expect(calcVoltageDrop({ ...drop, powerLength: '' })).toMatchObject({
      ok: false,
      field: 'powerLength',
      message: 'Enter a value.',
    });
  });
});

describe('area from readings', () => {
  it('area from mass returns the nominal area for a specimen of nominal copper', () => {
    // 1000 mm of 4 AWG copper: 21.15 mm² × 8.89 g/cm³ (IACS) × 1.02 (ASTM B496) = 191.79 g.
    const calc = calcAreaFromMass({
      system: 'metric',
      mass: '191.79',
      length: '1000',
      material: 'copper',
      strandingIncrementPercent: '2',
      compareLabel: '4 AWG',
    });
    if (!calc.ok) throw new Error(calc.message);
    expect(calc.value.result.areaMm2).toBeCloseTo(21.15, 2);
    expect(calc.value.measuresAs).toBe('4 AWG');
    expect(calc.value.compare?.ratio).toBeCloseTo(1, 3);
  });

  it('area from mass reads pounds and inches under the imperial preference', () => {
    const calc = calcAreaFromMass({
      system: 'imperial',
      mass: String(191.79 / 453.59237),
      length: String(1000 / 25.4),
      material: 'copper',
      strandingIncrementPercent: '2',
      compareLabel: '',
    });
    if (!calc.ok) throw new Error(calc.message);
    expect(calc.value.result.areaMm2).toBeCloseTo(21.15, 2);
    expect(calc.value.compare).toBeNull();
  });

  it('names the size by the one rule: 8.39 mm² of a 4 AWG label measures as 8 AWG, not the nearest', () => {
    // 76.1 g over 1 m of copper with a 2 % lay: 8.39 mm² (issue 3 check value); 8 AWG is
    // 8.367 mm² (ASTM B258) and 98 % of it is met (ASTM B496), 7 AWG (10.55) is not.
    const calc = calcAreaFromMass({
      system: 'metric',
      mass: '76.1',
      length: '1000',
      material: 'copper',
      strandingIncrementPercent: '2',
      compareLabel: '4 AWG',
    });
    if (!calc.ok) throw new Error(calc.message);
    expect(calc.value.measuresAs).toBe('8 AWG');
    // 10.3 mm² is nearer 7 AWG (10.55) on a log scale, but does not meet 98 % of it: 8 AWG.
    const between = calcAreaFromStrands({
      system: 'metric',
      count: '1',
      strandDiameters: String(Math.sqrt((4 * 10.3) / Math.PI)),
      compareLabel: '',
    });
    if (!between.ok) throw new Error(between.message);
    expect(between.value.measuresAs).toBe('8 AWG');
  });

  it('area from strands: 7 strands of 0.5 mm = 1.374 mm² (A = n·π d²/4)', () => {
    const calc = calcAreaFromStrands({
      system: 'metric',
      count: '7',
      strandDiameters: '0.499 0.5; 0.501',
      compareLabel: '',
    });
    if (!calc.ok) throw new Error(calc.message);
    expect(calc.value.result.areaMm2).toBeCloseTo((7 * Math.PI * 0.25) / 4, 4);
  });

  it('area from resistance corrects to 20 °C as IEC 60228 Annex B does, within 0.1 %', () => {
    const at = (temperatureC: string, mOhm: number) =>
      calcAreaFromResistance({
        system: 'metric',
        resistanceMilliOhm: String(mOhm),
        length: '1000',
        temperatureC,
        material: 'copper',
        strandingIncrementPercent: '0',
        compareLabel: '25 mm²',
      });
    // IEC 60228 Annex B: R20 = R25 × 254.5 / (234.5 + 25) (REFERENCE §2).
    const r20 = 0.78; // mΩ over 1 m: the class 5 limit for 25 mm² (IEC 60228, REFERENCE §4)
    const r25 = r20 / (254.5 / 259.5);
    const cold = at('20', r20);
    const warm = at('25', r25);
    if (!cold.ok || !warm.ok) throw new Error('expected results');
    expect(cold.value.result.areaMm2).toBeCloseTo(0.017241 / 0.00078, 1);
    expect(Math.abs(warm.value.result.areaMm2 / cold.value.result.areaMm2 - 1)).toBeLessThan(0.001);
  });

  it('refuses what it cannot use, naming the field', () => {
    expect(readNumbers('d', ' 0.5  0.51 ')).toEqual([0.5, 0.51]);
    expect(
      calcAreaFromStrands({ system: 'metric', count: '7', strandDiameters: '', compareLabel: '' }),
    ).toMatchObject({ ok: false, field: 'strandDiameterMm' });
    expect(
      calcAreaFromMass({
        system: 'metric',
        mass: '-3',
        length: '1000',
        material: 'copper',
        strandingIncrementPercent: '2',
        compareLabel: '',
      }),
    ).toMatchObject({ ok: false, field: 'massG' });
  });
});
