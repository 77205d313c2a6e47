import Papa from 'papaparse';
import type { LotSummary } from './lot-summary';

/**
 * A text cell a spreadsheet could read as a formula (= + - @, tab, CR) gets a leading
 * apostrophe and is shown as text (OWASP "CSV injection").
 */
export function guardCell(value: string | number | boolean | null): string | number | boolean {
  if (value === null) return '';
  if (typeof value === 'string' && /^[=+\-@\t\r]/.test(value)) return `'${value}`;
  return value;
}

export const LOT_CSV_COLUMNS = [
  'lotId',
  'receivedAt',
  'status',
  'poNumber',
  'packingSlip',
  'supplierLotCode',
  'supplierCode',
  'supplierName',
  'supplierStatus',
  'sku',
  'productDescription',
  'quantity',
  'unit',
  'severity',
  'inspectionLevel',
  'aql',
  'codeLetter',
  'sampleSize',
  'accept',
  'reject',
  'receivedBy',
] as const;

export function lotsCsv(lots: readonly LotSummary[]): string {
  const rows = lots.map((l) =>
    [
      l.id,
      l.receivedAt.toISOString(),
      l.status,
      l.poNumber,
      l.packingSlip,
      l.supplierLotCode,
      l.supplier.code,
      l.supplier.name,
      l.supplier.status,
      l.product.sku,
      l.product.description,
      l.quantity,
      l.unit,
      l.samplingPlan.severity,
      l.samplingPlan.level,
      l.samplingPlan.aql,
      l.samplingPlan.codeLetter,
      l.samplingPlan.sampleSize,
      l.samplingPlan.accept,
      l.samplingPlan.reject,
      l.receivedBy.name,
    ].map(guardCell),
  );
  return Papa.unparse({ fields: [...LOT_CSV_COLUMNS], data: rows }, { newline: '\r\n' });
}
