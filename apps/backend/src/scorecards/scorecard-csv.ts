import type { MethodAreaRatio, ScorecardRow, SupplierScorecard } from '@gaugeproof/api-types';
import { csvLines, type CsvCell } from '../common/csv';
import { percentText } from '../exports/readings-csv';

/**
 * The scorecard exports through the one CSV writer (common/csv.ts: formula-injection guard,
 * `;` and `,` quoted, RFC 4180) with a UTF-8 byte-order mark, headers in words with their
 * units, ratios as percentages with one decimal (issue 13 point 9), like the readings export.
 */
const withBom = (rows: readonly (readonly CsvCell[])[]): string => `\ufeff${csvLines(rows)}`;

const pct = (ratio: number | null | undefined): string =>
  ratio === null || ratio === undefined ? '' : percentText(ratio);
const days = (d: number | null): string => (d === null ? '' : d.toFixed(1));
const money = (amount: number): string => amount.toFixed(2);

/**
 * The currencies a chargeback column is written for: the server's own (`CURRENCY`) and every
 * other one a row was charged in, by code. One column per currency: amounts in different
 * currencies are never converted nor added together.
 */
export function chargebackCurrencies(
  rows: readonly ScorecardRow[],
  defaultCurrency: string,
): string[] {
  const codes = new Set([
    defaultCurrency,
    ...rows.flatMap((r) => r.chargebacks.map((c) => c.currency)),
  ]);
  return [...codes].sort();
}

const chargebackIn = (r: ScorecardRow, currency: string): string =>
  money(r.chargebacks.find((c) => c.currency === currency)?.amount ?? 0);

const METHODS: MethodAreaRatio['method'][] = ['mass', 'strands', 'resistance', 'diameter'];
const method = (r: ScorecardRow, m: string) => r.areaRatioByMethod.find((x) => x.method === m);

type Column = [string, (r: ScorecardRow) => CsvCell];

/** The ranking's columns: header in words with its unit, and the cell of a row. */
export const listColumns = (currencies: readonly string[]): readonly Column[] => [
  ['Supplier id', (r) => r.supplierId],
  ['Supplier', (r) => r.name],
  ['Code', (r) => r.code],
  ['Status', (r) => r.status],
  ['Lots received', (r) => r.lotsReceived],
  ['Lots accepted', (r) => r.lotsAccepted],
  ['Lots accepted on concession', (r) => r.lotsAcceptedOnConcession],
  ['Lots rejected', (r) => r.lotsRejected],
  ['Lots undecided', (r) => r.lotsPending],
  ['Lot acceptance (%)', (r) => pct(r.acceptanceRate)],
  ['Units tested', (r) => r.unitsTested],
  ['Nonconforming units', (r) => r.nonconformingUnits],
  ['Nonconforming units (%)', (r) => pct(r.unitNonconformingRate)],
  ['Nonconforming units per million', (r) => r.dppm],
  ['Conductors tested', (r) => r.samplesTested],
  ['Nonconforming conductors', (r) => r.nonconformingSamples],
  ['Readings', (r) => r.readings],
  ['Mean area of all methods (% of nominal)', (r) => pct(r.meanAreaRatio)],
  ['Lowest area (% of nominal)', (r) => pct(r.lowestAreaRatio)],
  ...METHODS.flatMap((m): [string, (r: ScorecardRow) => CsvCell][] => [
    [`Readings by ${m}`, (r) => method(r, m)?.readings ?? 0],
    [`Mean area by ${m} (% of nominal)`, (r) => pct(method(r, m)?.meanAreaRatio)],
    [`Lowest area by ${m} (% of nominal)`, (r) => pct(method(r, m)?.lowestAreaRatio)],
  ]),
  ['Material mismatches', (r) => r.materialMismatches],
  ['Worst shortfall (sizes)', (r) => r.worstSizesShort],
  ['Open SCARs', (r) => r.openCorrectiveActions],
  ['Overdue SCARs', (r) => r.overdueCorrectiveActions],
  ['Mean SCAR response (days)', (r) => days(r.meanResponseDays)],
  ...currencies.map((c): Column => [`Chargebacks (${c})`, (r) => chargebackIn(r, c)]),
];

export function listCsv(
  from: string,
  to: string,
  rows: readonly ScorecardRow[],
  defaultCurrency: string,
): string {
  const columns = listColumns(chargebackCurrencies(rows, defaultCurrency));
  return withBom([
    ['From', 'To', ...columns.map(([h]) => h)],
    ...rows.map((r) => [from, to, ...columns.map(([, cell]) => cell(r))]),
  ]);
}

/** Words for the long form's fields; a field not named here keeps its name. */
const FIELD_WORDS: Record<string, [string, (v: unknown) => CsvCell]> = {
  lots: ['Lots received', (v) => v as number],
  lotsAccepted: ['Lots accepted', (v) => v as number],
  lotsDecided: ['Lots decided', (v) => v as number],
  acceptanceRate: ['Lot acceptance (%)', (v) => pct(v as number | null)],
  meanAreaRatio: ['Mean area (% of nominal)', (v) => pct(v as number | null)],
  lowestAreaRatio: ['Lowest area (% of nominal)', (v) => pct(v as number | null)],
  samplesTested: ['Conductors tested', (v) => v as number],
  nonconformingSamples: ['Nonconforming conductors', (v) => v as number],
  count: ['Readings', (v) => v as number],
  description: ['Description', (v) => v as string],
  active: ['Active', (v) => (v ? 'yes' : 'no')],
  minAreaRatio: ['Minimum area (% of nominal)', (v) => pct(v as number)],
  severity: ['Inspection severity', (v) => v as string],
  reason: ['Why', (v) => v as string | null],
  poNumber: ['PO', (v) => v as string],
  receivedAt: ['Received', (v) => v as string],
  status: ['Status', (v) => v as string],
  sku: ['SKU', (v) => v as string],
  label: ['Label', (v) => v as string | null],
  measuresAs: ['Measures as', (v) => v as string | null],
  sizesShort: ['Sizes short', (v) => v as number | null],
  productId: ['Product id', (v) => v as number],
  readings: ['Readings', (v) => v as number],
};

/**
 * One supplier's scorecard in long form (section, item, field, value), so the summary,
 * the monthly trend, the histogram, purposes, products and worst lots share one table.
 */
export function supplierCsv(card: SupplierScorecard, defaultCurrency: string): string {
  const rows: CsvCell[][] = [['Section', 'Item', 'Field', 'Value']];
  const add = (section: string, item: string, record: object, skip?: string) => {
    for (const [field, value] of Object.entries(record)) {
      if (field === skip) continue;
      const words = FIELD_WORDS[field];
      rows.push([
        section,
        item,
        words ? words[0] : field,
        words ? words[1](value) : (value as CsvCell),
      ]);
    }
  };
  rows.push(['Range', '', 'From', card.from], ['Range', '', 'To', card.to]);
  for (const [header, cell] of listColumns(chargebackCurrencies([card], defaultCurrency))) {
    rows.push(['Summary', card.code, header, cell(card)]);
  }
  for (const t of card.trend) add('Trend', t.month, t, 'month');
  for (const b of card.histogram) {
    rows.push([
      'Histogram',
      `${pct(b.from) || '…'}–${pct(b.to) || '…'} % of nominal`,
      'Readings',
      b.count,
    ]);
  }
  for (const p of card.byPurpose) add('Conductor', p.purpose, p, 'purpose');
  for (const p of card.products) add('Product', p.sku, p, 'sku');
  for (const w of card.worstLots) add('Worst lot', String(w.lotId), w, 'lotId');
  return withBom(rows);
}
