import type { ListSort } from '@/components/data-table/use-list-params';
import type { ScorecardRow } from '@/features/scorecards/types';

/** Columns the ranking sorts by; the server already sends the rows worst first. */
export const RANK_SORT_FIELDS = [
  'name',
  'lotsReceived',
  'acceptanceRate',
  'dppm',
  'meanAreaRatio',
  'lowestAreaRatio',
  'openCorrectiveActions',
  'chargebacks',
] as const;
type RankField = (typeof RANK_SORT_FIELDS)[number];

const isRankField = (field: string): field is RankField =>
  (RANK_SORT_FIELDS as readonly string[]).includes(field);

/**
 * Chargebacks sort by currency first (a supplier's currency codes, by code) and by amount
 * within the same currency: amounts in different currencies are not comparable without a
 * rate, and none is applied. Rows without chargebacks go last, as unknown values do.
 */
function compareChargebacks(a: ScorecardRow, b: ScorecardRow, dir: number): number {
  const x = a.chargebacks;
  const y = b.chargebacks;
  if (x.length === 0 || y.length === 0) return x.length === y.length ? 0 : x.length === 0 ? 1 : -1;
  const codes = (t: ScorecardRow['chargebacks']) => t.map((c) => c.currency).join(' ');
  return codes(x).localeCompare(codes(y)) || dir * (x[0].amount - y[0].amount);
}

/**
 * Sorts and pages the ranking in the browser: the API answers one row per supplier (a
 * shop has tens, not thousands), so there is nothing to page on the server. Unknown
 * values (null) go last in either direction; ties keep the server's worst-first order.
 */
export function rankRows(
  rows: readonly ScorecardRow[],
  sort: ListSort | null,
  page: number,
  pageSize: number,
): { items: ScorecardRow[]; total: number } {
  const ordered = [...rows];
  if (sort && isRankField(sort.field)) {
    const field = sort.field;
    const dir = sort.direction === 'asc' ? 1 : -1;
    ordered.sort((a, b) => {
      if (field === 'chargebacks') return compareChargebacks(a, b, dir);
      const x = a[field];
      const y = b[field];
      if (x === null || y === null) return x === y ? 0 : x === null ? 1 : -1;
      if (typeof x === 'string' && typeof y === 'string') return dir * x.localeCompare(y);
      return dir * (Number(x) - Number(y));
    });
  }
  const start = (page - 1) * pageSize;
  return { items: ordered.slice(start, start + pageSize), total: rows.length };
}
