import { csvLines as lines, type CsvCell } from '../common/csv';
import type { ExportedReading } from './readings-export.query';

/** Columns of the readings export, in order. */
export const READING_COLUMNS = [
  'readingId',
  'lotId',
  'poNumber',
  'supplier',
  'sku',
  'receivedAt',
  'unit',
  'conductor',
  'label',
  'method',
  'inputs',
  'areaMm2',
  'UMm2',
  'areaRatio',
  'measuresAs',
  'identifiedMaterial',
  'verdict',
  'takenAt',
  'voided',
  'voidReason',
] as const;

/** `massG=76.1; lengthMm=1000` in the order the clerk entered them. */
export function inputsText(inputs: Record<string, number>): string {
  return Object.entries(inputs)
    .map(([k, v]) => `${k}=${v}`)
    .join('; ');
}

function cells(r: ExportedReading): CsvCell[] {
  return [
    r.id,
    r.lotId,
    r.poNumber,
    r.supplier,
    r.sku,
    r.receivedAt.toISOString(),
    r.unitRef ?? `Unit ${r.seq}`,
    r.purpose,
    r.gaugeLabel,
    r.method,
    inputsText(r.inputs),
    r.areaMm2,
    r.expandedUMm2,
    r.areaRatio,
    r.measuresAs,
    r.identifiedMaterial,
    r.verdict,
    r.takenAt.toISOString(),
    r.voided,
    r.voidReason,
  ];
}

/** CSV lines (CRLF) with the formula-injection guard of common/csv.ts; numbers stay numbers. */
export function csvLines(rows: readonly ExportedReading[]): string {
  return lines(rows.map(cells));
}

/** The header line, after a UTF-8 byte-order mark so spreadsheets read "mm²" right. */
export function csvHeader(): string {
  return `\ufeff${lines([READING_COLUMNS])}`;
}
