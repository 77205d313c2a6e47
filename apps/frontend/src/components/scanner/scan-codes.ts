/**
 * What the scanner reads and what a scanned text means. Pure, so the first screen can
 * use it without loading the camera or the decoder.
 */

/** Barcode formats of the receiving dock (names of the Barcode Detection API). */
export const DOCK_FORMATS = ['code_128', 'qr_code', 'data_matrix', 'ean_13', 'ean_8'] as const;
export type DockFormat = (typeof DOCK_FORMATS)[number];

export const FORMAT_LABELS: Record<string, string> = {
  code_128: 'Code 128',
  qr_code: 'QR code',
  data_matrix: 'Data Matrix',
  ean_13: 'EAN-13',
  ean_8: 'EAN-8',
};

export interface ScannedCode {
  text: string;
  format: string;
}

/**
 * The lot a scanned text names when it is one of our own tags: the hold tag's QR code
 * holds `<public address>/lots/<id>/bench` (held lots) or `/lots/<id>` (decided lots).
 * The bench address is ours wherever the server's public address points; a bare lot
 * address only on this origin, so another company's label is never taken for a tag.
 */
export function lotOfTag(text: string, origin: string): { lotId: number; bench: boolean } | null {
  let address: URL;
  try {
    address = new URL(text.trim());
  } catch {
    return null;
  }
  if (address.protocol !== 'http:' && address.protocol !== 'https:') return null;
  const match = /^\/lots\/(\d{1,15})(\/bench)?\/?$/.exec(address.pathname);
  if (!match) return null;
  const lotId = Number(match[1]);
  if (!Number.isSafeInteger(lotId) || lotId <= 0) return null;
  const bench = match[2] !== undefined;
  if (!bench && address.origin !== origin) return null;
  return { lotId, bench };
}

/**
 * A scanned text as a form field takes it: control characters (a GS1 group separator,
 * a trailing CR from a label printer) become spaces, runs of space one, trimmed, and cut
 * to the field's length.
 */
// eslint-disable-next-line no-control-regex -- control characters are what it removes
const CONTROL = /[\u0000-\u001f\u007f]+/g;

export function fieldText(text: string, maxLength: number): string {
  return text.replace(CONTROL, ' ').replace(/\s+/g, ' ').trim().slice(0, maxLength);
}
