import { describe, expect, it } from 'vitest';
import {
  acceptanceSeries,
  histogramSeries,
  purposeSeries,
  sparklinePoints,
} from '@/features/scorecards/lib/chart-data';
import { rankRows } from '@/features/scorecards/lib/rank-rows';
import type { ScorecardRow, TrendPoint } from '@/features/scorecards/types';

describe('histogramSeries', () => {
  it('turns the server bins into a step series on a percent axis', () => {
    const s = histogramSeries([
      { from: null, to: 0.3, count: 2 },
      { from: 0.3, to: 0.325, count: 1 },
      { from: 0.325, to: 0.35, count: 4 },
      { from: 0.35, to: null, count: 0 },
    ]);
    expect(s.edgesPercent).toEqual([30, 32.5, 35]);
    expect(s.steps).toEqual([1, 4, 4]); // last count repeated to close the step
    expect(s.below).toEqual({ edgePercent: 30, count: 2 });
    expect(s.above).toBeNull(); // nothing at or above the last edge
    expect(s.total).toBe(7);
  });

  it('is empty without bins', () => {
    expect(histogramSeries([])).toMatchObject({ edgesPercent: [], steps: [], total: 0 });
  });
});

const point = (month: string, acceptanceRate: number | null, lots = 1): TrendPoint => ({
  month,
  lots,
  lotsAccepted: 0,
  lotsDecided: acceptanceRate === null ? 0 : 2,
  acceptanceRate,
  meanAreaRatio: null,
});

describe('trend series', () => {
  it('keeps gaps in the monthly chart and drops them from the sparkline', () => {
    const trend = [point('2026-01', 0.5), point('2026-02', null, 0), point('2026-03', 0.755)];
    expect(acceptanceSeries(trend).ratePercent).toEqual([50, null, 75.5]);
    expect(acceptanceSeries(trend).decided).toBe(4);
    expect(sparklinePoints(trend)).toEqual({
      months: ['2026-01', '2026-03'],
      ratePercent: [50, 75.5],
    });
  });

  it('splits samples by purpose into conforming and nonconforming', () => {
    expect(
      purposeSeries([{ purpose: 'power', samplesTested: 7, nonconformingSamples: 4 }]),
    ).toEqual({ purposes: ['power'], nonconforming: [4], conforming: [3] });
  });
});

describe('rankRows', () => {
  const row = (name: string, acceptanceRate: number | null) =>
    ({ name, acceptanceRate }) as ScorecardRow;
  const rows = [row('b', 0.9), row('a', null), row('c', 0.4)];

  it('keeps the server order without a sort and pages', () => {
    expect(rankRows(rows, null, 1, 2)).toEqual({ items: [rows[0], rows[1]], total: 3 });
  });

  it('sorts either way with unknown values last', () => {
    const names = (dir: 'asc' | 'desc') =>
      rankRows(rows, { field: 'acceptanceRate', direction: dir }, 1, 10).items.map((r) => r.name);
    expect(names('asc')).toEqual(['c', 'b', 'a']);
    expect(names('desc')).toEqual(['b', 'c', 'a']);
  });

  it('sorts chargebacks by currency, then by amount within it, never across currencies', () => {
    const charged = (name: string, chargebacks: ScorecardRow['chargebacks']) =>
      ({ name, chargebacks }) as ScorecardRow;
    const mixed = [
      charged('usd-small', [{ currency: 'USD', amount: 5 }]),
      charged('none', []),
      charged('eur-big', [{ currency: 'EUR', amount: 900 }]),
      charged('usd-big', [{ currency: 'USD', amount: 700 }]),
      charged('eur-small', [{ currency: 'EUR', amount: 1 }]),
    ];
    const names = (dir: 'asc' | 'desc') =>
      rankRows(mixed, { field: 'chargebacks', direction: dir }, 1, 10).items.map((r) => r.name);
    expect(names('desc')).toEqual(['eur-big', 'eur-small', 'usd-big', 'usd-small', 'none']);
    expect(names('asc')).toEqual(['eur-small', 'eur-big', 'usd-small', 'usd-big', 'none']);
  });
});
