import {
  LOT_QUANTITY,
  PASSWORD,
  READING_LIMITS,
  RETURN_AMOUNTS,
  TEXT_MAX,
  parseDecimal as contractParseDecimal,
} from '@gaugeproof/api-types';
import { describe, expect, it } from 'vitest';
import { instrumentSchema } from '@/features/instruments/api/create-instrument';
import { buildReadingSchema, parseDecimal } from '@/features/inspection/lib/reading-form';
import { METHODS } from '@/features/inspection/lib/reading-methods';
import { createLotSchema, parseLotQuantity } from '@/features/lots/api/create-lot';
import {
  EMPTY_PRODUCT,
  productSchema,
  toProductBody,
} from '@/features/products/api/create-product';
import { readNumber } from '@/features/reference/calculations';
import { shipSchema } from '@/features/returns/api/return-steps';
import { createUserSchema } from '@/features/users/api/create-user';
import { decimalText, maxChars, passwordProblem } from '@/lib/contract-rules';

/** The first message a schema gives for `value`, or null when it takes it. */
const firstIssue = (result: { success: boolean; error?: { issues: { message: string }[] } }) =>
  result.success ? null : (result.error?.issues[0]?.message ?? null);

describe('the client takes its rules from the contract (libs/api-types)', () => {
  it('reads numbers as the CSV import does: one parseDecimal, "0x10" refused everywhere', () => {
    expect(parseDecimal).toBe(contractParseDecimal);
    const mass = buildReadingSchema(METHODS.mass);
    const form = (massG: string) => ({
      values: { massG, lengthMm: '1000' },
      instruments: { massResolutionG: '7', lengthResolutionMm: '' },
    });
    expect(firstIssue(mass.safeParse(form('0x10')))).toBe('Enter a number, in g.');
    expect(firstIssue(mass.safeParse(form('76,1')))).toBeNull();
    expect(() => readNumber('massG', '0x10')).toThrow('Enter a number.');
    expect(readNumber('massG', '2,5')).toBe(2.5);
    expect(firstIssue(decimalText('Enter it.').safeParse('0x10'))).toBe('Enter it.');
    const instrument = {
      kind: 'balance',
      name: 'Bench balance',
      serial: 'B-9',
      resolution: '0x10',
      resolutionUnit: 'g',
      accuracyPercentOfReading: '',
      accuracyAbsolute: '',
      calibrationUncertainty: '',
      calibratedOn: '2026-01-01',
      calibrationDueOn: '2027-01-01',
    };
    expect(firstIssue(instrumentSchema.safeParse(instrument))).toBe(
      'The smallest step it shows, a number greater than 0.',
    );
    expect(instrumentSchema.safeParse({ ...instrument, resolution: '0,01' }).success).toBe(true);
  });

  it('bounds a resistance reading’s temperature as the server does', () => {
    const { min, max } = READING_LIMITS.temperatureC;
    const resistance = buildReadingSchema(METHODS.resistance);
    const form = (temperatureC: string) => ({
      values: { resistanceOhm: '0.8', lengthMm: '1000', temperatureC },
      instruments: { resistanceResolutionOhm: '9' },
    });
    expect(firstIssue(resistance.safeParse(form(String(max))))).toBeNull();
    expect(firstIssue(resistance.safeParse(form(String(min))))).toBeNull();
    // The server refuses above 100 °C; the client once took up to 150 °C.
    expect(firstIssue(resistance.safeParse(form('120')))).toBe(
      `Enter a temperature from ${min} to ${max} °C.`,
    );
  });

  it('bounds lengths, diameters and strand lists as the server does', () => {
    const mass = buildReadingSchema(METHODS.mass);
    const massForm = (lengthMm: string) => ({
      values: { massG: '76.1', lengthMm },
      instruments: { massResolutionG: '7', lengthResolutionMm: '' },
    });
    expect(firstIssue(mass.safeParse(massForm('5')))).toBe(
      `Enter at least ${READING_LIMITS.lengthMm.min} mm.`,
    );
    expect(firstIssue(mass.safeParse(massForm('200000')))).toBe(
      `Enter at most ${READING_LIMITS.lengthMm.max} mm.`,
    );
    const strands = buildReadingSchema(METHODS.strands);
    const strandForm = (strandDiameterMm: string) => ({
      values: { count: '41', strandDiameterMm },
      instruments: { diameterResolutionMm: '3' },
    });
    expect(firstIssue(strands.safeParse(strandForm('0.25 25')))).toBe(
      `Each must be at most ${READING_LIMITS.strandDiameterMm.max} mm.`,
    );
    expect(firstIssue(strands.safeParse(strandForm(Array(11).fill('0.25').join(' '))))).toBe(
      `Enter at most ${READING_LIMITS.strandDiameters.max} values.`,
    );
  });

  it('takes a lot’s quantity and text lengths from the contract', () => {
    expect(parseLotQuantity(String(LOT_QUANTITY.max))).toBe(LOT_QUANTITY.max);
    expect(parseLotQuantity(String(LOT_QUANTITY.max + 1))).toBeNull();
    const lot = {
      supplierId: 1,
      productId: 2,
      poNumber: 'PO-1',
      packingSlip: '',
      supplierLotCode: '',
      quantity: String(LOT_QUANTITY.max + 1),
      unit: 'spools',
      notes: 'x'.repeat(TEXT_MAX.long),
    };
    expect(firstIssue(createLotSchema.safeParse(lot))).toBe(
      `At most ${LOT_QUANTITY.max} units in one lot.`,
    );
    // The server keeps notes up to TEXT_MAX.long; the form once stopped at 2000.
    expect(createLotSchema.safeParse({ ...lot, quantity: '500' }).success).toBe(true);
    expect(maxChars('reference')).toEqual([TEXT_MAX.reference, 'At most 64 characters.']);
  });

  it('reads a product’s numbers with parseDecimal and its bounds from the contract', () => {
    const product = {
      ...EMPTY_PRODUCT,
      supplierId: '1',
      sku: 'SKU-1',
      description: '4 AWG power cable',
      lengthPerUnitM: '12,5',
      conductors: [{ ...EMPTY_PRODUCT.conductors[0], gauge: '4 AWG' }],
    };
    const parsed = productSchema.parse(product);
    expect(toProductBody(parsed).lengthPerUnitM).toBe(12.5);
    expect(firstIssue(productSchema.safeParse({ ...product, lengthPerUnitM: '0x10' }))).toMatch(
      /^A length in metres/,
    );
    const many = Array(13).fill(product.conductors[0]);
    expect(firstIssue(productSchema.safeParse({ ...product, conductors: many }))).toBe(
      'At most 12 conductors.',
    );
  });

  it('refuses a password the server refuses, by its bytes', () => {
    expect(passwordProblem('short')).toBe(`At least ${PASSWORD.minLength} characters.`);
    expect(passwordProblem('é'.repeat(40))).toMatch(/^At most 72 bytes/);
    expect(passwordProblem('a long enough passphrase')).toBeNull();
    const user = { email: 'a@shop.example', name: 'A', role: 'clerk', password: 'é'.repeat(40) };
    expect(firstIssue(createUserSchema.safeParse(user))).toMatch(/^At most 72 bytes/);
  });

  it('bounds a shipped quantity as the server does', () => {
    const ship = {
      carrier: 'Road freight',
      trackingNumber: '',
      shippedOn: '2026-12-01',
      quantity: String(RETURN_AMOUNTS.shippedQuantity.max * 10),
    };
    expect(firstIssue(shipSchema.safeParse(ship))).toBe(
      `At most ${RETURN_AMOUNTS.shippedQuantity.max}.`,
    );
    expect(shipSchema.safeParse({ ...ship, quantity: '0x10' }).success).toBe(false);
    expect(shipSchema.parse({ ...ship, quantity: '12,5' }).quantity).toBe(12.5);
  });
});
