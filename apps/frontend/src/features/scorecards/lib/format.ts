/** Display helpers for scorecard figures; the API sends ratios as fractions. */
import type { MoneyTotal } from '@/features/scorecards/types';

const percent1 = new Intl.NumberFormat('en-US', {
  style: 'percent',
  minimumFractionDigits: 1,
  maximumFractionDigits: 1,
});
const whole = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });
const money = new Intl.NumberFormat('en-US', {
  minimumFractionDigits: 2,
  maximumFractionDigits: 2,
});

export const NONE = '—';

export const formatPercent = (value: number | null) =>
  value === null ? NONE : percent1.format(value);
export const formatWhole = (value: number | null) => (value === null ? NONE : whole.format(value));
/** Chargebacks, one amount per ISO 4217 currency ("EUR 200.00", "USD 35.25"); never summed across. */
export const formatMoneyTotals = (totals: readonly MoneyTotal[]): string[] =>
  totals.map((t) => `${t.currency} ${money.format(t.amount)}`);
export const formatDays = (value: number | null) =>
  value === null ? NONE : `${value.toFixed(1)} d`;
