import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { StandardsInputError } from '../errors.js';
import { awgGauge } from './awg.js';
import { largestSizeReached, measuresAs } from './measures-as.js';

describe('measuresAs (nearest standard size on a log scale, issue 3)', () => {
  it('puts the issue-3 sample (8.39 mm²) at 8 AWG, ratio ≈ 1.003 of 8.367 (ASTM B258)', () => {
    const m = measuresAs(8.3923);
    expect(m.gauge.label).toBe('8 AWG');
    expect(m.ratio).toBeCloseTo(8.3923 / 8.367, 6);
  });

  it('picks the nearer size on a log scale, not a linear one', () => {
    // Between 5 AWG (16.77 mm²) and 4 AWG (21.15 mm²) the log midpoint is √(16.77·21.15) ≈ 18.83.
    const low = awgGauge(5).nominalAreaMm2;
    const high = awgGauge(4).nominalAreaMm2;
    const mid = Math.sqrt(low * high);
    expect(measuresAs(mid * 0.999).gauge.label).toBe('5 AWG');
    expect(measuresAs(mid * 1.001).gauge.label).toBe('4 AWG');
    // the linear midpoint (18.96) is already 4 AWG on a log scale
    expect(measuresAs((low + high) / 2).gauge.label).toBe('4 AWG');
  });

  it('uses the metric series for metric labels (IEC 60228, from memory)', () => {
    expect(measuresAs(23, 'metric').gauge.label).toBe('25 mm²');
    expect(measuresAs(19, 'metric').gauge.label).toBe('16 mm²');
  });

  it('returns every standard size as itself with ratio 1 (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -3, max: 40 }), (n) => {
        const g = awgGauge(n);
        expect(measuresAs(g.nominalAreaMm2)).toEqual({ gauge: g, ratio: 1 });
      }),
    );
  });

  it('refuses areas that are not positive', () => {
    for (const bad of [0, -1, NaN, Infinity]) {
      expect(() => measuresAs(bad)).toThrow(StandardsInputError);
    }
    expect(() => measuresAs(1, 'sae' as 'awg')).toThrow(StandardsInputError);
  });
});

describe('largestSizeReached (DESIGN.md meaning)', () => {
  it('is the largest size whose nominal area is reached', () => {
    expect(largestSizeReached(8.3923)?.gauge.label).toBe('8 AWG'); // 8.367 ≤ 8.3923 < 10.55
    expect(largestSizeReached(21.14)?.gauge.label).toBe('5 AWG'); // just short of 21.15 (B258)
    expect(largestSizeReached(21.15)?.gauge.label).toBe('4 AWG');
    expect(largestSizeReached(24, 'metric')?.gauge.label).toBe('16 mm²');
    expect(largestSizeReached(0.0001)).toBeNull();
  });
});
