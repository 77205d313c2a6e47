import Papa from 'papaparse';
import type { ScorecardRow, SupplierScorecard } from '@gaugeproof/api-types';

type Cell = string | number | boolean | null;

/**
 * CSV with the formula-injection guard: a text cell starting with = + - @ tab or CR gets
 * a leading apostrophe so a spreadsheet shows it as text (OWASP "CSV injection"; papaparse
 * escapeFormulae uses exactly that set). Numbers are left as numbers.
 */
export function toCsv(header: readonly string[], rows: readonly Cell[][]): string {
  return Papa.unparse(
    { fields: [...header], data: rows.map((r) => r.map((c) => (c === null ? '' : c))) },
    { escapeFormulae: true, newline: '\r\n' },
  );
}

/** Columns of the ranking export: the row's own field names, so each traces to the API. */
export const LIST_COLUMNS = [
  'supplierId',
  'name',
  'code',
  'status',
  'lotsReceived',
  'lotsAccepted',
  'lotsAcceptedOnConcession',
  'lotsRejected',
  'lotsPending',
  'acceptanceRate',
  'samplesTested',
  'nonconformingSamples',
  'dppm',
  'readings',
  'meanAreaRatio',
  'lowestAreaRatio',
  'materialMismatches',
  'worstSizesShort',
  'openCorrectiveActions',
  'overdueCorrectiveActions',
  'meanResponseDays',
  'chargebacks',
] as const satisfies readonly (keyof ScorecardRow)[];

export function listCsv(from: string, to: string, rows: readonly ScorecardRow[]): string {
  return toCsv(
    ['from', 'to', ...LIST_COLUMNS],
    rows.map((r) => [from, to, ...LIST_COLUMNS.map((c) => r[c] as Cell)]),
  );
}

/**
 * One supplier's scorecard in long form (section, item, field, value), so the summary,
 * the monthly trend, the histogram, purposes, products and worst lots share one table.
 */
export function supplierCsv(card: SupplierScorecard): string {
  const rows: Cell[][] = [];
  const add = (section: string, item: string, record: object, skip?: string) => {
    for (const [field, value] of Object.entries(record)) {
      if (field !== skip) rows.push([section, item, field, (value ?? null) as Cell]);
    }
  };
  add('range', '', { from: card.from, to: card.to });
  add('summary', card.code, Object.fromEntries(LIST_COLUMNS.map((c) => [c, card[c]])));
  for (const t of card.trend) add('trend', t.month, t, 'month');
  for (const b of card.histogram) {
    add('histogram', `${b.from ?? ''}..${b.to ?? ''}`, { count: b.count });
  }
  for (const p of card.byPurpose) add('purpose', p.purpose, p, 'purpose');
  for (const p of card.products) add('product', p.sku, p, 'sku');
  for (const w of card.worstLots) add('worstLot', String(w.lotId), w, 'lotId');
  return toCsv(['section', 'item', 'field', 'value'], rows);
}
