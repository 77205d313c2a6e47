import { roundWithUncertainty } from '@gaugeproof/standards';
import { csvLines as lines, type CsvCell } from '../common/csv';
import {
  INPUT_COLUMNS,
  inputValue,
  materialWords,
  methodWords,
  utcMinute,
  yesNo,
} from '../common/reading-words';
import type { ExportedReading } from './readings-export.query';

/**
 * Columns of the readings export, in order: written for the supplier's quality department
 * (issue 14), headers in words with their units, one column per raw input, the papers a
 * supplier files the goods under (their lot code, our PO and packing slip, RTV, RMA, NCR),
 * results at their precision (GUM 7.2.6) and ratios as percentages with one decimal.
 */
export const READING_COLUMNS = [
  'Reading',
  'Lot',
  'Supplier lot code',
  'PO',
  'Packing slip',
  'RTV',
  'RMA',
  'NCR',
  'Supplier',
  'SKU',
  'Received (UTC)',
  'Unit',
  'Conductor',
  'Label',
  'Method',
  ...INPUT_COLUMNS.map((c) => c.label),
  'Instruments',
  'Area (mm²)',
  'U, k=2 (mm²)',
  'Coverage factor k',
  'Of nominal (%)',
  'Measures as',
  'Material found',
  'Verdict',
  'Confirmed unusual',
  'Taken (UTC)',
  'Voided',
  'Void reason',
] as const;

/**
 * The coverage factor a reading's U was taken with: U ÷ u, to two decimals (k = 2, or
 * GUM Table G.2's t for few strand diameters, GUM G.4.1).
 */
export function coverageFactorOf(u: number, U: number): number | null {
  return u > 0 ? Math.round((U / u) * 100) / 100 : null;
}

/** A ratio as a percentage with one decimal (issue 13 point 9): 0.39685 → "39.7". */
export const percentText = (ratio: number): string => (ratio * 100).toFixed(1);

function cells(r: ExportedReading): CsvCell[] {
  const area = roundWithUncertainty(r.areaMm2, r.expandedUMm2);
  const out: CsvCell[] = [
    r.id,
    r.lotId,
    r.supplierLotCode,
    r.poNumber,
    r.packingSlip,
    r.rtvNumber,
    r.rmaNumber,
    r.ncrNumber,
    r.supplier,
    r.sku,
    utcMinute(r.receivedAt),
    r.unitRef ?? `Unit ${r.seq}`,
    r.purpose,
    r.gaugeLabel,
    methodWords(r.method, r.fourWire),
  ];
  for (const c of INPUT_COLUMNS) out.push(inputValue(r.inputs, c));
  out.push(
    r.instruments,
    area.value,
    area.U,
    coverageFactorOf(r.uMm2, r.expandedUMm2),
    percentText(r.areaRatio),
    r.measuresAs,
    materialWords(r.identifiedMaterial),
    r.verdict,
    yesNo(r.confirmedUnusual),
    utcMinute(r.takenAt),
    yesNo(r.voided),
    r.voidReason,
  );
  return out;
}

/** CSV lines (CRLF) with the formula-injection guard of common/csv.ts. */
export function csvLines(rows: readonly ExportedReading[]): string {
  return lines(rows.map(cells));
}

/** The header line, after a UTF-8 byte-order mark so spreadsheets read "mm²" right. */
export function csvHeader(): string {
  return `\ufeff${lines([READING_COLUMNS])}`;
}
