import { describe, expect, it } from 'vitest';
import {
  buildReadingSchema,
  emptyReadingForm,
  parseDecimal,
  readingInputs,
  slotResolutions,
  toReadingRequest,
  type ReadingFormValues,
} from '@/features/inspection/lib/reading-form';
import { METHODS } from '@/features/inspection/lib/reading-methods';
import { previewReading } from '@/features/inspection/lib/reading-preview';
import type { Instrument } from '@/features/inspection/types';

const balance: Instrument = {
  id: 7,
  kind: 'balance',
  name: 'Bench balance',
  serial: 'B-1',
  resolution: 0.1,
  resolutionUnit: 'g',
  calibratedOn: '2026-01-01',
  calibrationDueOn: '2027-01-01',
  active: true,
  calibrationStatus: 'ok',
  daysToDue: 200,
  accuracyPercentOfReading: null,
  accuracyAbsolute: null,
  calibrationUncertainty: null,
  version: 1,
  createdAt: '2026-01-01T08:00:00.000Z',
  updatedAt: '2026-01-01T08:00:00.000Z',
};
const meter: Instrument = {
  ...balance,
  id: 9,
  kind: 'milliohm_meter',
  resolution: 0.001,
  resolutionUnit: 'mohm',
};

const massForm = (massG: string, lengthMm: string, balanceId = '7'): ReadingFormValues => ({
  values: { massG, lengthMm },
  instruments: { massResolutionG: balanceId, lengthResolutionMm: '' },
});

describe('reading form validation', () => {
  const schema = buildReadingSchema(METHODS.mass);

  it('asks for every input and the balance', () => {
    const result = schema.safeParse(emptyReadingForm(METHODS.mass));
    expect(result.success).toBe(false);
    const messages = result.error?.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    expect(messages).toEqual([
      'values.massG: Enter the mass of the strands.',
      'values.lengthMm: Enter the cut length.',
      'instruments.massResolutionG: Choose the balance you used.',
    ]);
  });

  it('refuses text, zero and negative values, and accepts a decimal comma', () => {
    expect(schema.safeParse(massForm('abc', '1000')).error?.issues[0]?.message).toBe(
      'Enter a number, in g.',
    );
    expect(schema.safeParse(massForm('0', '1000')).error?.issues[0]?.message).toBe(
      'Must be greater than 0.',
    );
    expect(schema.safeParse(massForm('76.1', '-5')).error?.issues[0]?.message).toBe(
      'Must be greater than 0.',
    );
    expect(schema.safeParse(massForm('76,1', '1000')).success).toBe(true);
    expect(parseDecimal('76,1')).toBe(76.1);
    expect(parseDecimal('1e3')).toBe(1000);
    expect(parseDecimal('7 6')).toBeNull();
  });

  it('wants a whole strand count and a plausible temperature', () => {
    const strands = buildReadingSchema(METHODS.strands);
    const form = {
      values: { count: '41.5', strandDiameterMm: '0.25' },
      instruments: { diameterResolutionMm: '3' },
    };
    expect(strands.safeParse(form).error?.issues[0]?.message).toBe('Enter a whole number.');
    const resistance = buildReadingSchema(METHODS.resistance);
    const cold = {
      values: { resistanceOhm: '0.8', lengthMm: '1000', temperatureC: '-3' },
      instruments: { resistanceResolutionOhm: '9' },
    };
    expect(resistance.safeParse(cold).success).toBe(true);
    const hot = { ...cold, values: { ...cold.values, temperatureC: '400' } };
    expect(resistance.safeParse(hot).error?.issues[0]?.message).toBe(
      'Enter a temperature from -40 to 100 °C.',
    );
  });

  it('builds the request in request units with the chosen instruments', () => {
    expect(toReadingRequest(METHODS.mass, massForm('76.1', '1000'))).toEqual({
      method: 'mass',
      massG: 76.1,
      lengthMm: 1000,
      instrumentIds: [7],
    });
    const form = {
      values: { resistanceOhm: '2.05', lengthMm: '1000', temperatureC: '20' },
      instruments: { resistanceResolutionOhm: '9' },
    };
    expect(readingInputs(METHODS.resistance, form)?.resistanceOhm).toBeCloseTo(0.00205, 10);
    expect(slotResolutions(METHODS.resistance, form, [meter]).resistanceResolutionOhm).toBeCloseTo(
      1e-6,
      12,
    );
  });
});

describe('live preview', () => {
  it('a 4 AWG copper sample weighing 76.1 g over 1000 mm measures as 8 AWG and is nonconforming', () => {
    const form = massForm('76.1', '1000');
    const preview = previewReading({
      definition: METHODS.mass,
      inputs: readingInputs(METHODS.mass, form) ?? {},
      resolutions: slotResolutions(METHODS.mass, form, [balance]),
      gauge: '4 AWG',
      claimedMaterial: 'copper',
      minAreaRatio: 0.98,
    });
    expect(preview.ok).toBe(true);
    if (!preview.ok) return;
    // A = m / (ρ L (1 + k)) = 76.1 / (0.00889 × 1000 × 1.02) = 8.392 mm² (ASTM B263, B496 k = 2 %).
    expect(preview.area.areaMm2).toBeCloseTo(8.392, 3);
    expect(preview.assessment.measuresAs.label).toBe('8 AWG');
    expect(preview.assessment.verdict).toBe('nonconforming');
    expect(preview.assessment.areaRatio).toBeCloseTo(8.392 / 21.15, 2);
  });

  it('reports the library’s refusal instead of a number', () => {
    const preview = previewReading({
      definition: METHODS.mass,
      inputs: { massG: 76.1 },
      resolutions: {},
      gauge: '4 AWG',
      claimedMaterial: 'copper',
      minAreaRatio: 0.98,
    });
    expect(preview).toMatchObject({ ok: false, field: 'lengthMm' });
  });
});
