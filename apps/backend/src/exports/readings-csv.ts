import Papa from 'papaparse';
import type { ExportedReading } from './readings-export.query';

/** Columns of the readings export, in order. */
export const READING_COLUMNS = [
  'readingId',
  'lotId',
  'poNumber',
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

type Cell = string | number | boolean | null;

/** `massG=76.1; lengthMm=1000` in the order the clerk entered them. */
export function inputsText(inputs: Record<string, number>): string {
  return Object.entries(inputs)
    .map(([k, v]) => `${k}=${v}`)
    .join('; ');
}

function cells(r: ExportedReading): Cell[] {
  return [
    r.id,
    r.lotId,
    r.poNumber,
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

/**
 * CSV lines (CRLF) with the formula-injection guard: a text cell starting with = + - @ tab
 * or CR gets a leading apostrophe so a spreadsheet shows it as text (OWASP "CSV injection";
 * papaparse's escapeFormulae uses exactly that set). Numbers stay numbers.
 */
export function csvLines(rows: readonly ExportedReading[]): string {
  if (rows.length === 0) return '';
  const data = rows.map((r) => cells(r).map((c) => (c === null ? '' : c)));
  return `${Papa.unparse(data, { escapeFormulae: true, newline: '\r\n' })}\r\n`;
}

export function csvHeader(): string {
  return `${Papa.unparse([[...READING_COLUMNS]], { newline: '\r\n' })}\r\n`;
}
