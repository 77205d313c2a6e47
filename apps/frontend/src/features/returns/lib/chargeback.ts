import type { ReturnCosts } from '@/features/returns/types';

/**
 * Chargeback = inspection hours × hourly rate + freight + other, rounded to the cent, as
 * the server computes it (common practice for sorting and inspection chargebacks, no source).
 * Missing or non-numeric parts count as zero.
 */
export function chargebackTotal(costs: ReturnCosts): number {
  const n = (v: number | undefined) => (typeof v === 'number' && Number.isFinite(v) ? v : 0);
  const total = n(costs.inspectionHours) * n(costs.hourlyRate) + n(costs.freight) + n(costs.other);
  return Math.round(total * 100) / 100;
}

const money = new Intl.NumberFormat('en-US', {
  minimumFractionDigits: 2,
  maximumFractionDigits: 2,
});
/** An amount with its ISO 4217 code, as on the evidence pack and in the e-mail: "EUR 1,234.50". */
export const formatMoney = (value: number, currency: string) =>
  `${currency} ${money.format(value)}`;
