import { describe, expect, it } from 'vitest';
import {
  areaFromDiameter,
  areaFromMass,
  areaFromResistance,
  areaFromStrands,
  assessSample,
  identifyMaterial,
  initialInspectionState,
  lotOutcome,
  measuresAs,
  nextInspectionState,
  parseGauge,
  samplingPlan,
  StandardsInputError,
  voltageDrop,
} from './index.js';

/** Runs `fn` and returns the `field` of the StandardsInputError it throws. */
function fieldOf(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(StandardsInputError);
    expect((e as Error).name).toBe('StandardsInputError');
    expect((e as Error).message.length).toBeGreaterThan(10);
    return (e as StandardsInputError).field;
  }
  throw new Error('expected a StandardsInputError');
}

const BAD_SIZES = [NaN, Infinity, -Infinity, 0, -1];

describe('every function refuses bad input with StandardsInputError and the field', () => {
  it.each(BAD_SIZES)('areaFromMass refuses massG = %s and lengthMm = %s', (bad) => {
    expect(fieldOf(() => areaFromMass({ massG: bad, lengthMm: 1000 }))).toBe('massG');
    expect(fieldOf(() => areaFromMass({ massG: 76.1, lengthMm: bad }))).toBe('lengthMm');
  });

  it('areaFromMass refuses bad options', () => {
    expect(
      fieldOf(() => areaFromMass({ massG: 1, lengthMm: 1, material: 'brass' as 'copper' })),
    ).toBe('material');
    expect(fieldOf(() => areaFromMass({ massG: 1, lengthMm: 1, strandingIncrement: 2 }))).toBe(
      'strandingIncrement',
    );
    expect(fieldOf(() => areaFromMass({ massG: 1, lengthMm: 1, strandingIncrement: -0.01 }))).toBe(
      'strandingIncrement',
    );
    expect(fieldOf(() => areaFromMass({ massG: 1, lengthMm: 1, massResolutionG: -0.1 }))).toBe(
      'massResolutionG',
    );
    expect(fieldOf(() => areaFromMass({ massG: 1, lengthMm: 1, lengthResolutionMm: NaN }))).toBe(
      'lengthResolutionMm',
    );
    expect(
      fieldOf(() =>
        areaFromMass({ massG: 1, lengthMm: 1, balance: { accuracyPercentOfReading: Infinity } }),
      ),
    ).toBe('balance.accuracyPercentOfReading');
    expect(
      fieldOf(() => areaFromMass({ massG: 1, lengthMm: 1, rule: { calibrationUncertainty: -1 } })),
    ).toBe('rule.calibrationUncertainty');
  });

  it.each(BAD_SIZES)('the other methods refuse %s', (bad) => {
    expect(fieldOf(() => areaFromStrands({ count: 7, strandDiameterMm: bad }))).toBe(
      'strandDiameterMm',
    );
    expect(fieldOf(() => areaFromStrands({ count: 7, strandDiameterMm: [0.25, bad] }))).toBe(
      'strandDiameterMm',
    );
    expect(fieldOf(() => areaFromStrands({ count: bad, strandDiameterMm: 0.25 }))).toBe('count');
    expect(fieldOf(() => areaFromDiameter({ diameterMm: bad }))).toBe('diameterMm');
    expect(fieldOf(() => areaFromResistance({ resistanceOhm: bad, lengthMm: 1000 }))).toBe(
      'resistanceOhm',
    );
    expect(fieldOf(() => areaFromResistance({ resistanceOhm: 0.001, lengthMm: bad }))).toBe(
      'lengthMm',
    );
    expect(fieldOf(() => voltageDrop({ areaMm2: bad, circuitLengthM: 5, currentA: 100 }))).toBe(
      'areaMm2',
    );
    expect(fieldOf(() => voltageDrop({ areaMm2: 21.15, circuitLengthM: bad, currentA: 100 }))).toBe(
      'circuitLengthM',
    );
    expect(fieldOf(() => measuresAs(bad))).toBe('areaMm2');
    expect(fieldOf(() => identifyMaterial({ massG: bad, lengthMm: 1000 }))).toBe('massG');
    expect(
      fieldOf(() => identifyMaterial({ massG: 76.1, lengthMm: 1000, resistanceOhm: bad })),
    ).toBe('resistanceOhm');
    expect(
      fieldOf(() => identifyMaterial({ massG: 76.1, lengthMm: 1000, geometricAreaMm2: bad })),
    ).toBe('geometricAreaMm2');
    expect(
      fieldOf(() =>
        assessSample({ gauge: '4', claimedMaterial: 'copper', areaMm2: bad, UMm2: 0.1 }),
      ),
    ).toBe('areaMm2');
  });

  it('refuses fractional strand counts, odd temperatures and negative currents', () => {
    expect(fieldOf(() => areaFromStrands({ count: 7.5, strandDiameterMm: 0.25 }))).toBe('count');
    expect(fieldOf(() => areaFromStrands({ count: 7, strandDiameterMm: [] }))).toBe(
      'strandDiameterMm',
    );
    expect(
      fieldOf(() =>
        areaFromResistance({ resistanceOhm: 0.001, lengthMm: 1000, temperatureC: NaN }),
      ),
    ).toBe('temperatureC');
    expect(
      fieldOf(() =>
        areaFromResistance({ resistanceOhm: 0.001, lengthMm: 1000, temperatureC: 900 }),
      ),
    ).toBe('temperatureC');
    expect(fieldOf(() => voltageDrop({ areaMm2: 21.15, circuitLengthM: 5, currentA: -1 }))).toBe(
      'currentA',
    );
    expect(fieldOf(() => voltageDrop({ areaMm2: 21.15, circuitLengthM: 5, currentA: NaN }))).toBe(
      'currentA',
    );
  });

  it('refuses unknown labels and materials', () => {
    expect(fieldOf(() => parseGauge('7 SAE'))).toBe('label');
    expect(fieldOf(() => parseGauge('huge'))).toBe('label');
    expect(fieldOf(() => parseGauge(undefined as unknown as string))).toBe('label');
    expect(
      fieldOf(() => assessSample({ gauge: '5/0', claimedMaterial: 'copper', areaMm2: 1, UMm2: 0 })),
    ).toBe('label');
    expect(
      fieldOf(() =>
        assessSample({ gauge: '4', claimedMaterial: 'silver' as 'copper', areaMm2: 1, UMm2: 0 }),
      ),
    ).toBe('claimedMaterial');
    expect(
      fieldOf(() => assessSample({ gauge: '4', claimedMaterial: 'copper', areaMm2: 1, UMm2: -1 })),
    ).toBe('UMm2');
    expect(
      fieldOf(() =>
        assessSample({
          gauge: '4',
          claimedMaterial: 'copper',
          areaMm2: 1,
          UMm2: 0,
          minAreaRatio: 98,
        }),
      ),
    ).toBe('minAreaRatio');
    expect(
      fieldOf(() =>
        assessSample({
          gauge: '4',
          claimedMaterial: 'copper',
          areaMm2: 1,
          UMm2: 0,
          identifiedMaterial: 'steel' as 'cca',
        }),
      ),
    ).toBe('identifiedMaterial');
  });

  it('refuses lot sizes below 1, unknown levels, AQLs and severities', () => {
    for (const lotSize of [0, -5, 2.5, NaN, Infinity]) {
      expect(fieldOf(() => samplingPlan({ lotSize }))).toBe('lotSize');
    }
    expect(fieldOf(() => samplingPlan({ lotSize: 800, aql: '0.3' as '1.0' }))).toBe('aql');
    expect(fieldOf(() => samplingPlan({ lotSize: 800, aql: NaN }))).toBe('aql');
    expect(fieldOf(() => samplingPlan({ lotSize: 800, level: 'IV' as 'II' }))).toBe('level');
    expect(fieldOf(() => samplingPlan({ lotSize: 800, severity: 'lenient' as 'normal' }))).toBe(
      'severity',
    );
    expect(fieldOf(() => lotOutcome(samplingPlan({ lotSize: 800 }), NaN))).toBe(
      'nonconformingCount',
    );
    expect(fieldOf(() => lotOutcome({} as ReturnType<typeof samplingPlan>, 0))).toBe('plan');
    expect(
      fieldOf(() =>
        nextInspectionState(null as unknown as ReturnType<typeof initialInspectionState>, {
          accepted: true,
        }),
      ),
    ).toBe('state');
  });
});
