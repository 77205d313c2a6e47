import { describe, expect, it } from 'vitest';
import { chargebackTotal, formatMoney } from '@/features/returns/lib/chargeback';
import { returnEditable, returnSteps } from '@/features/returns/lib/return-steps';

describe('chargeback arithmetic', () => {
  it('is hours × rate + freight + other', () => {
    // 2.5 h × 48.00 = 120.00; + 35.50 freight + 12.25 other = 167.75
    expect(
      chargebackTotal({ inspectionHours: 2.5, hourlyRate: 48, freight: 35.5, other: 12.25 }),
    ).toBe(167.75);
  });

  it('counts missing parts as zero: hours without a rate charge nothing', () => {
    expect(chargebackTotal({})).toBe(0);
    expect(chargebackTotal({ inspectionHours: 3 })).toBe(0);
    expect(chargebackTotal({ freight: 20 })).toBe(20);
    expect(chargebackTotal({ inspectionHours: Number.NaN, hourlyRate: 40, other: 5 })).toBe(5);
  });

  it('rounds to the cent', () => {
    // 0.1 + 0.2 in binary floating point is 0.30000000000000004
    expect(chargebackTotal({ freight: 0.1, other: 0.2 })).toBe(0.3);
    // 1.15 h × 33.33 = 38.3295 → 38.33
    expect(chargebackTotal({ inspectionHours: 1.15, hourlyRate: 33.33 })).toBe(38.33);
  });

  it('writes every amount with its ISO 4217 code', () => {
    expect(formatMoney(1234.5, 'EUR')).toMatch(/^EUR\s1,234\.50$/);
    expect(formatMoney(0, 'USD')).toMatch(/^USD\s0\.00$/);
  });
});

describe('return steps', () => {
  it('offers what the server allows: ship or cancel a draft, then one step at a time', () => {
    expect(returnSteps('draft')).toEqual(['ship', 'cancel']);
    expect(returnSteps('emailed')).toEqual(['ship']);
    expect(returnSteps('shipped')).toEqual(['acknowledge']);
    expect(returnSteps('acknowledged')).toEqual(['credit', 'close']);
    expect(returnSteps('closed')).toEqual([]);
    expect(returnSteps('cancelled')).toEqual([]);
  });

  it('keeps a closed or cancelled return as it is', () => {
    expect(returnEditable('acknowledged')).toBe(true);
    expect(returnEditable('closed')).toBe(false);
    expect(returnEditable('cancelled')).toBe(false);
  });
});
