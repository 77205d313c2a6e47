import { describe, expect, it } from 'vitest';
import {
  acceptanceRate,
  areaRatioByMethod,
  compareWorstFirst,
  dppm,
  trendOf,
} from './scorecard-assemble';
import { monthBuckets } from './scorecard-range';
import type { ScorecardRow } from '@gaugeproof/api-types';

describe('scorecard arithmetic', () => {
  it('rates only decided lots and gives null without any', () => {
    expect(acceptanceRate(3, 4)).toBe(0.75);
    expect(acceptanceRate(0, 0)).toBeNull();
  });

  it('counts nonconforming units per million', () => {
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
          method: 'mass',
          readings: 3,
          sumRatio: 2.85,
          minRatio: 0.8,
          worstSizesShort: 1,
        },
        {
          supplierId: 1,
          monthIdx: 1,
          method: 'resistance',
          readings: 1,
          sumRatio: 0.95,
          minRatio: 0.95,
          worstSizesShort: 0,
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

  it('keeps area ratios apart by method, pooling months', () => {
    const row = (monthIdx: number, method: string, readings: number, sumRatio: number) => ({
      supplierId: 1,
      monthIdx,
      method,
      readings,
      sumRatio,
      minRatio: sumRatio / readings - 0.01,
      worstSizesShort: 0,
    });
    const byMethod = areaRatioByMethod([
      row(0, 'resistance', 2, 1.9),
      row(0, 'mass', 2, 0.8),
      row(1, 'mass', 2, 1.2),
    ]);
    expect(byMethod.map((m) => [m.method, m.readings])).toEqual([
      ['mass', 4],
      ['resistance', 2],
    ]);
    expect(byMethod[0].meanAreaRatio).toBeCloseTo(0.5, 12); // (0.8 + 1.2) / 4
    expect(byMethod[0].lowestAreaRatio).toBeCloseTo(0.39, 12);
    expect(byMethod[1].meanAreaRatio).toBeCloseTo(0.95, 12);
  });

  it('ranks worst first and unrated suppliers last', () => {
    const row = (name: string, acceptanceRate: number | null) =>
      ({ name, acceptanceRate, meanAreaRatio: null, lotsReceived: 0 }) as ScorecardRow;
    const sorted = [row('c', null), row('b', 0.9), row('a', 0.5)].sort(compareWorstFirst);
    expect(sorted.map((r) => r.name)).toEqual(['a', 'b', 'c']);
  });
});
