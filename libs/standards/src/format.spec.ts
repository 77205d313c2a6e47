import { describe, expect, it } from 'vitest';
import {
  formatPercent,
  formatValueAtUncertainty,
  formatWithUncertainty,
  roundWithUncertainty,
} from './format.js';

describe('figures at their precision (GUM 7.2.6: U to two significant figures)', () => {
  it('rounds U to two significant figures and the value to the same place', () => {
    expect(roundWithUncertainty(20.8138, 0.2189)).toEqual({
      value: '20.81',
      U: '0.22',
      decimals: 2,
    });
    expect(formatWithUncertainty(8.39231, 0.0094, 'mm²')).toBe('8.3923 ± 0.0094 mm²');
    expect(formatWithUncertainty(0.76543, 0.01234, 'Ω/km')).toBe('0.765 ± 0.012 Ω/km');
    expect(formatWithUncertainty(1234.5, 56.7)).toBe('1235 ± 57');
    expect(formatWithUncertainty(12345, 567)).toBe('12350 ± 570');
    expect(formatValueAtUncertainty(20.8138, 0.2189, 'mm²')).toBe('20.81 mm²');
  });

  it('carries U into the next decade without a third figure (0.0996 → 0.10)', () => {
    expect(roundWithUncertainty(5.12345, 0.0996)).toEqual({
      value: '5.12',
      U: '0.10',
      decimals: 2,
    });
    expect(roundWithUncertainty(5.12345, 9.96).U).toBe('10');
  });

  it('keeps four significant figures when there is no usable U', () => {
    expect(roundWithUncertainty(21.14876, 0).value).toBe('21.15');
    expect(roundWithUncertainty(21.14876, NaN).U).toBe('0');
  });

  it('prints ratios as percentages with one decimal', () => {
    expect(formatPercent(0.39685)).toBe('39.7 %');
    expect(formatPercent(1)).toBe('100.0 %');
    expect(formatPercent(-0.00001)).toBe('0.0 %');
  });
});
