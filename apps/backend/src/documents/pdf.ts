// pdfkit is loaded on the first PDF, not at start: it holds about 10 MB the server would
// otherwise carry all its life (measured with process.memoryUsage, bench notes in README).
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import type PDFDocument from 'pdfkit';

export type Pdf = InstanceType<typeof PDFDocument>;

/** Our palette for tags and packs (our own choice of colours). */
export const COLOURS = {
  hold: '#E8A317',
  rejected: '#C62828',
  accepted: '#2E7D32',
  concession: '#1565C0',
  ink: '#1C1C1C',
  muted: '#5F6B73',
  rule: '#C9D1D6',
  copper: '#B87333',
  measured: '#7A8A99',
} as const;

/**
 * The two faces every document writes with. pdfkit's built-in Helvetica is a Latin-1 (WinAnsi)
 * font: a Polish, Cyrillic or Greek letter came out as garbage and shifted the ASCII after it
 * ("4 AWG" printed as "BWG"). DejaVu Sans covers Latin, Greek and Cyrillic; pdfkit embeds the
 * subset of glyphs a document uses. Font files: npm package `dejavu-fonts-ttf` (Bitstream Vera
 * licence plus public-domain DejaVu changes, see its LICENSE; shipped unmodified).
 */
export const FONT = { body: 'GpBody', bold: 'GpBold' } as const;

let fontFiles: { body: Buffer; bold: Buffer } | undefined;
function fonts() {
  if (!fontFiles) {
    const dir = join(dirname(require.resolve('dejavu-fonts-ttf/package.json')), 'ttf');
    fontFiles = {
      body: readFileSync(join(dir, 'DejaVuSans.ttf')),
      bold: readFileSync(join(dir, 'DejaVuSans-Bold.ttf')),
    };
  }
  return fontFiles;
}

/** Renders a PDF into a buffer; `draw` writes the pages, with FONT.body and FONT.bold registered. */
export async function renderPdf(
  options: ConstructorParameters<typeof PDFDocument>[0],
  draw: (doc: Pdf) => void | Promise<void>,
): Promise<Buffer> {
  const { default: PdfDocument } = await import('pdfkit');
  const files = fonts();
  return new Promise((resolve, reject) => {
    const doc = new PdfDocument({ ...options, bufferPages: false });
    doc.registerFont(FONT.body, files.body);
    doc.registerFont(FONT.bold, files.bold);
    doc.font(FONT.body);
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    Promise.resolve(draw(doc))
      .then(() => doc.end())
      .catch(reject);
  });
}

/** "2026-11-03 14:05 UTC" — dates on paper carry their zone. */
export function paperDate(d: Date | null | undefined): string {
  if (!d) return '—';
  return `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}

export interface FitOptions {
  bold?: boolean;
  /** Largest size to try, points. */
  size: number;
  /** Smallest size before the text is cut with an ellipsis, points. */
  minSize?: number;
  colour?: string;
  align?: 'left' | 'center' | 'right';
}

/**
 * Writes `text` wrapped inside the box (x, y, width, height) and never outside it: the size
 * steps down from `size` to `minSize` until the wrapped text fits, and what still does not
 * fit at `minSize` is cut with an ellipsis. Returns the size used.
 */
export function fitText(
  doc: Pdf,
  text: string,
  x: number,
  y: number,
  width: number,
  height: number,
  o: FitOptions,
): number {
  const font = o.bold ? FONT.bold : FONT.body;
  const minSize = o.minSize ?? Math.min(o.size, 6);
  doc.font(font).fillColor(o.colour ?? COLOURS.ink);
  // The longest word must fit on a line too: pdfkit breaks a word wider than the box inside
  // it ("CONCESSIO / N" on the tag), which reads as two words.
  const words = text.split(/\s+/).filter(Boolean);
  let size = o.size;
  for (; size > minSize; size = Math.max(minSize, size - 0.5)) {
    doc.fontSize(size);
    const widest = Math.max(0, ...words.map((w) => doc.widthOfString(w)));
    if (widest <= width && doc.heightOfString(text, { width, lineGap: 0 }) <= height) break;
  }
  doc.fontSize(size);
  doc.text(text, x, y, { width, height, ellipsis: true, lineGap: 0, align: o.align ?? 'left' });
  return size;
}

/** A field: its name small and muted, its value wrapped inside the rest of the box. */
export function label(
  doc: Pdf,
  x: number,
  y: number,
  name: string,
  value: string,
  width: number,
  height = 26,
) {
  doc
    .font(FONT.body)
    .fontSize(7)
    .fillColor(COLOURS.muted)
    .text(name.toUpperCase(), x, y, { width, height: 9, ellipsis: true, lineBreak: false });
  fitText(doc, value, x, y + 9, width - 4, height - 10, { bold: true, size: 10, minSize: 6 });
}
