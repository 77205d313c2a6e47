import type { CsvRow } from '../common/csv';
import type { LotSummary } from './lot-summary';

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

/** One lot as a CSV row; common/csv.ts writes it with its formula guard. */
export function lotCsvRow(l: LotSummary): CsvRow {
  return [
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
  ];
}
