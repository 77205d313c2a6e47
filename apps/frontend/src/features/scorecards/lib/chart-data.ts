import type { HistogramBin, PurposeCount, TrendPoint } from '@/features/scorecards/types';

/**
 * ASTM B496 minimum area: 98 % of nominal, the line on the histogram. A product's own
 * `minAreaRatio` may be set differently; the product list shows it.
 */
export const ASTM_B496_MIN_RATIO = 0.98;

export interface HistogramSeries {
  /** Bin edges in percent, for a linear x axis: 30, 32.5 … 110. */
  edgesPercent: number[];
  /** Count of each bin, repeated once at the end so a step curve closes the last bin. */
  steps: number[];
  below: { edgePercent: number; count: number } | null;
  above: { edgePercent: number; count: number } | null;
  total: number;
}

const toPercent = (fraction: number) => Math.round(fraction * 1000) / 10;

/**
 * The server's bins (open-ended ones at both ends) as a step series on a linear percent
 * axis, so the 98 % line sits at its true place rather than on a category.
 */
export function histogramSeries(bins: readonly HistogramBin[]): HistogramSeries {
  const closed = bins.filter((b) => b.from !== null && b.to !== null);
  const low = bins.find((b) => b.from === null && b.to !== null);
  const high = bins.find((b) => b.to === null && b.from !== null);
  const edgesPercent = closed.length
    ? [...closed.map((b) => toPercent(b.from as number)), toPercent(closed.at(-1)?.to as number)]
    : [];
  const counts = closed.map((b) => b.count);
  return {
    edgesPercent,
    steps: counts.length ? [...counts, counts[counts.length - 1]] : [],
    below:
      low && low.count > 0 ? { edgePercent: toPercent(low.to as number), count: low.count } : null,
    above:
      high && high.count > 0
        ? { edgePercent: toPercent(high.from as number), count: high.count }
        : null,
    total: bins.reduce((n, b) => n + b.count, 0),
  };
}

/** Acceptance rate per month in percent; null (a gap) where no lot was decided. */
export function acceptanceSeries(trend: readonly TrendPoint[]) {
  return {
    months: trend.map((p) => p.month),
    ratePercent: trend.map((p) => (p.acceptanceRate === null ? null : toPercent(p.acceptanceRate))),
    lots: trend.map((p) => p.lots),
    decided: trend.reduce((n, p) => n + p.lotsDecided, 0),
  };
}

/** The sparkline's points: only months with decided lots, so no invented values. */
export function sparklinePoints(trend: readonly TrendPoint[]) {
  const known = trend.filter((p) => p.acceptanceRate !== null);
  return {
    months: known.map((p) => p.month),
    ratePercent: known.map((p) => toPercent(p.acceptanceRate as number)),
  };
}

/** Conforming and nonconforming samples per conductor purpose, for a stacked bar chart. */
export function purposeSeries(rows: readonly PurposeCount[]) {
  return {
    purposes: rows.map((r) => r.purpose),
    nonconforming: rows.map((r) => r.nonconformingSamples),
    conforming: rows.map((r) => r.samplesTested - r.nonconformingSamples),
  };
}
