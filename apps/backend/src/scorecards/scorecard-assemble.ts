import type { MonthBucket } from './scorecard-range';
import type { MethodAreaRatio, MoneyTotal, ScorecardRow, TrendPoint } from '@gaugeproof/api-types';
import type {
  CorrectiveActionRow,
  LotMonthRow,
  ReadingMonthRow,
  SamplePurposeRow,
  UnitRow,
} from './supplier-metrics.query';

export interface SupplierIdentity {
  id: number;
  name: string;
  code: string;
  status: ScorecardRow['status'];
}

/** The aggregate rows of one supplier, as the metric queries returned them. */
export interface SupplierAggregates {
  lots: LotMonthRow[];
  readings: ReadingMonthRow[];
  samples: SamplePurposeRow[];
  units: UnitRow | undefined;
  correctiveActions: CorrectiveActionRow | undefined;
  /** One total per ISO 4217 currency, by code. */
  chargebacks: MoneyTotal[];
}

const DAY_MS = 86_400_000;

/**
 * Lot acceptance rate = lots accepted on inspection ÷ lots decided (accepted + accepted on
 * concession + rejected, `returned` counting as rejected). A concession is a nonconforming
 * lot used anyway, so it is not an acceptance (the common definition of lot acceptance
 * rate; common practice, no source). Lots still on hold or being inspected are left out of
 * the rate, not counted against the supplier. Null when nothing was decided.
 */
export function acceptanceRate(accepted: number, decided: number): number | null {
  return decided > 0 ? accepted / decided : null;
}

/**
 * Nonconforming units per million units tested (DPPM-style: defective parts per million;
 * common practice, no source). Null when nothing was tested.
 */
export function dppm(nonconforming: number, tested: number): number | null {
  return tested > 0 ? Math.round((nonconforming / tested) * 1_000_000) : null;
}

function sum<T>(rows: readonly T[], pick: (row: T) => number): number {
  return rows.reduce((total, row) => total + pick(row), 0);
}

function minOf(values: readonly (number | null)[]): number | null {
  const known = values.filter((v): v is number => v !== null);
  return known.length ? Math.min(...known) : null;
}

function maxOf(values: readonly (number | null)[]): number | null {
  const known = values.filter((v): v is number => v !== null);
  return known.length ? Math.max(...known) : null;
}

/** One trend point per month of the range, months without lots included with zeros. */
export function trendOf(
  months: readonly MonthBucket[],
  lots: readonly LotMonthRow[],
  readings: readonly ReadingMonthRow[],
): TrendPoint[] {
  return months.map((m, i) => {
    const l = lots.find((row) => row.monthIdx === i);
    const month = readings.filter((row) => row.monthIdx === i);
    const n = sum(month, (row) => row.readings);
    const accepted = l?.accepted ?? 0;
    const decided = l ? l.accepted + l.concession + l.rejected : 0;
    return {
      month: m.month,
      lots: l?.lots ?? 0,
      lotsAccepted: accepted,
      lotsDecided: decided,
      acceptanceRate: acceptanceRate(accepted, decided),
      meanAreaRatio: n > 0 ? sum(month, (row) => row.sumRatio) / n : null,
    };
  });
}

const METHODS = ['mass', 'strands', 'resistance', 'diameter'] as const;

/** Mean and lowest area ratio per method, methods with readings only, in the form's order. */
export function areaRatioByMethod(readings: readonly ReadingMonthRow[]): MethodAreaRatio[] {
  return METHODS.flatMap((method) => {
    const rows = readings.filter((r) => r.method === method);
    const n = sum(rows, (r) => r.readings);
    if (n === 0) return [];
    return [
      {
        method,
        readings: n,
        meanAreaRatio: sum(rows, (r) => r.sumRatio) / n,
        lowestAreaRatio: minOf(rows.map((r) => r.minRatio)),
      },
    ];
  });
}

/** Folds one supplier's aggregate rows into its scorecard row. */
export function assembleRow(
  supplier: SupplierIdentity,
  months: readonly MonthBucket[],
  agg: SupplierAggregates,
): ScorecardRow {
  const lotsReceived = sum(agg.lots, (r) => r.lots);
  const lotsAccepted = sum(agg.lots, (r) => r.accepted);
  const lotsAcceptedOnConcession = sum(agg.lots, (r) => r.concession);
  const lotsRejected = sum(agg.lots, (r) => r.rejected);
  const decided = lotsAccepted + lotsAcceptedOnConcession + lotsRejected;
  const samplesTested = sum(agg.samples, (r) => r.tested);
  const nonconformingSamples = sum(agg.samples, (r) => r.nonconforming);
  const readings = sum(agg.readings, (r) => r.readings);
  const unitsTested = agg.units?.tested ?? 0;
  const nonconformingUnits = agg.units?.nonconforming ?? 0;
  const worst = maxOf(agg.readings.map((r) => r.worstSizesShort));
  const meanMs = agg.correctiveActions?.meanResponseMs ?? null;
  return {
    supplierId: supplier.id,
    name: supplier.name,
    code: supplier.code,
    status: supplier.status,
    lotsReceived,
    lotsAccepted,
    lotsAcceptedOnConcession,
    lotsRejected,
    lotsPending: lotsReceived - decided,
    acceptanceRate: acceptanceRate(lotsAccepted, decided),
    samplesTested,
    nonconformingSamples,
    unitsTested,
    nonconformingUnits,
    unitNonconformingRate: unitsTested > 0 ? nonconformingUnits / unitsTested : null,
    dppm: dppm(nonconformingUnits, unitsTested),
    readings,
    meanAreaRatio: readings > 0 ? sum(agg.readings, (r) => r.sumRatio) / readings : null,
    lowestAreaRatio: minOf(agg.readings.map((r) => r.minRatio)),
    areaRatioByMethod: areaRatioByMethod(agg.readings),
    materialMismatches: sum(agg.samples, (r) => r.mismatches),
    // A lot measuring larger than its label is not short: 0, not a negative count.
    worstSizesShort: worst === null ? null : Math.max(0, worst),
    openCorrectiveActions: agg.correctiveActions?.open ?? 0,
    overdueCorrectiveActions: agg.correctiveActions?.overdue ?? 0,
    meanResponseDays: meanMs === null ? null : meanMs / DAY_MS,
    chargebacks: agg.chargebacks,
    trend: trendOf(months, agg.lots, agg.readings),
  };
}

/**
 * Worst first: lowest acceptance rate, then lowest mean area ratio, then most lots; a
 * supplier without decided lots sorts after every rated one, then by name.
 */
export function compareWorstFirst(a: ScorecardRow, b: ScorecardRow): number {
  const rate = (r: ScorecardRow) => r.acceptanceRate ?? Infinity;
  const ratio = (r: ScorecardRow) => r.meanAreaRatio ?? Infinity;
  return (
    rate(a) - rate(b) ||
    ratio(a) - ratio(b) ||
    b.lotsReceived - a.lotsReceived ||
    a.name.localeCompare(b.name)
  );
}
