// pdfkit is loaded on the first PDF, not at start: it holds about 10 MB the server would
// otherwise carry all its life (measured with process.memoryUsage, bench notes in README).
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

/** Renders a PDF into a buffer; `draw` writes the pages. */
export async function renderPdf(
  options: ConstructorParameters<typeof PDFDocument>[0],
  draw: (doc: Pdf) => void | Promise<void>,
): Promise<Buffer> {
  const { default: PdfDocument } = await import('pdfkit');
  return new Promise((resolve, reject) => {
    const doc = new PdfDocument({ ...options, bufferPages: false });
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

export function label(doc: Pdf, x: number, y: number, name: string, value: string, width: number) {
  doc
    .font('Helvetica')
    .fontSize(7)
    .fillColor(COLOURS.muted)
    .text(name.toUpperCase(), x, y, { width });
  doc
    .font('Helvetica-Bold')
    .fontSize(10)
    .fillColor(COLOURS.ink)
    .text(value, x, y + 9, { width });
}
