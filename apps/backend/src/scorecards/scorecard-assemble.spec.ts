import { describe, expect, it } from 'vitest';
import { acceptanceRate, compareWorstFirst, dppm, trendOf } from './scorecard-assemble';
import { monthBuckets } from './scorecard-range';
import type { ScorecardRow } from '@gaugeproof/api-types';

describe('scorecard arithmetic', () => {
  it('rates only decided lots and gives null without any', () => {
    expect(acceptanceRate(3, 4)).toBe(0.75);
    expect(acceptanceRate(0, 0)).toBeNull();
  });

  it('counts nonconforming samples per million', () => {
    expect(dppm(1, 3)).toBe(333_333); // 1/3 × 10⁶, rounded
    expect(dppm(0, 0)).toBeNull();
  });

  it('fills months without lots with zeros', () => {
    const months = monthBuckets(new Date('2025-01-01T00:00:00Z'), new Date('2025-04-01T00:00:00Z'));
    const trend = trendOf(
      months,
      [{ supplierId: 1, monthIdx: 1, lots: 2, accepted: 1, concession: 0, rejected: 1 }],
      [
        {
          supplierId: 1,
          monthIdx: 1,
          readings: 4,
          sumRatio: 3.8,
          minRatio: 0.8,
          worstSizesShort: 1,
        },
      ],
    );
    expect(trend.map((p) => [p.month, p.lots, p.acceptanceRate])).toEqual([
      ['2025-01', 0, null],
      ['2025-02', 2, 0.5],
      ['2025-03', 0, null],
    ]);
    expect(trend[1].meanAreaRatio).toBeCloseTo(0.95, 12);
  });

  it('ranks worst first and unrated suppliers last', () => {
    const row = (name: string, acceptanceRate: number | null) =>
      ({ name, acceptanceRate, meanAreaRatio: null, lotsReceived: 0 }) as ScorecardRow;
    const sorted = [row('c', null), row('b', 0.9), row('a', 0.5)].sort(compareWorstFirst);
    expect(sorted.map((r) => r.name)).toEqual(['a', 'b', 'c']);
  });
});
