import { drawCrossSections, type CrossSection } from './cross-section';
import { COLOURS, FONT, paperDate, renderPdf, type Pdf } from './pdf';

export interface EvidenceReading {
  unit: number;
  conductor: string;
  method: string;
  inputs: string;
  areaMm2: number;
  expandedUMm2: number;
  areaRatio: number;
  measuresAs: string;
  material: string | null;
  verdict: string;
  voided: boolean;
}

export interface EvidenceLot {
  title: string;
  plan: string;
  counts: string;
  decision: string;
  sections: CrossSection[];
  readings: EvidenceReading[];
  thumbnails: { image: Buffer; caption: string }[];
}

export interface EvidencePackData {
  number: string;
  supplier: string;
  status: string;
  rmaNumber: string | null;
  createdAt: Date;
  chargeback: string[];
  lots: EvidenceLot[];
  cautions: readonly string[];
}

const M = 40;
const PAGE_W = 595.28; // A4
const BOTTOM = 800;
const COLS: [string, number][] = [
  ['Unit', 28],
  ['Conductor', 52],
  ['Method', 48],
  ['Area mm²', 50],
  ['U (k=2)', 44],
  ['Ratio', 36],
  ['Measures as', 60],
  ['Material', 50],
  ['Verdict', 70],
  ['Inputs', 77],
];

function heading(doc: Pdf, text: string) {
  if (doc.y > BOTTOM - 60) doc.addPage();
  doc.moveDown(0.6).font(FONT.bold).fontSize(12).fillColor(COLOURS.ink).text(text, M);
  doc
    .moveTo(M, doc.y + 2)
    .lineTo(PAGE_W - M, doc.y + 2)
    .lineWidth(0.5)
    .stroke(COLOURS.rule);
  doc.moveDown(0.4);
}

function readingsTable(doc: Pdf, readings: EvidenceReading[]) {
  const row = (cells: string[], bold: boolean, colour: string) => {
    if (doc.y > BOTTOM) doc.addPage();
    const y = doc.y;
    let x = M;
    doc
      .font(bold ? FONT.bold : FONT.body)
      .fontSize(7)
      .fillColor(colour);
    cells.forEach((c, i) => {
      doc.text(c, x, y, { width: COLS[i][1] - 3, height: 9, ellipsis: true, lineBreak: false });
      x += COLS[i][1];
    });
    doc.y = y + 11;
    doc.x = M;
  };
  row(
    COLS.map(([h]) => h),
    true,
    COLOURS.muted,
  );
  for (const r of readings) {
    const colour = r.voided
      ? COLOURS.muted
      : r.verdict === 'nonconforming'
        ? COLOURS.rejected
        : COLOURS.ink;
    row(
      [
        String(r.unit),
        r.conductor,
        r.method,
        r.areaMm2.toFixed(2),
        `± ${r.expandedUMm2.toFixed(2)}`,
        r.areaRatio.toFixed(3),
        r.measuresAs,
        r.material ?? '—',
        r.voided ? `${r.verdict} (voided)` : r.verdict,
        r.inputs,
      ],
      false,
      colour,
    );
  }
}

function lotSection(doc: Pdf, lot: EvidenceLot) {
  heading(doc, lot.title);
  doc.font(FONT.body).fontSize(9).fillColor(COLOURS.ink);
  doc
    .text(`Sampling plan: ${lot.plan}`, M)
    .text(`Counts: ${lot.counts}`, M)
    .text(`Decision: ${lot.decision}`, M);
  doc.moveDown(0.5);
  let x = M;
  let y = doc.y;
  for (const s of lot.sections) {
    if (y > BOTTOM - 130) {
      doc.addPage();
      y = doc.y;
    }
    const bottom = drawCrossSections(doc, x, y, s);
    x += 260;
    if (x > PAGE_W - 260) {
      x = M;
      y = bottom + 6;
    }
  }
  doc.x = M;
  doc.y = x === M ? y : y + 150;
  doc
    .font(FONT.bold)
    .fontSize(9)
    .fillColor(COLOURS.ink)
    .text('Every reading, with its expanded uncertainty', M);
  doc.moveDown(0.3);
  readingsTable(doc, lot.readings);
  if (lot.thumbnails.length) {
    doc.moveDown(0.5).font(FONT.bold).fontSize(9).text('Photos', M);
    let px = M;
    let py = doc.y + 4;
    for (const t of lot.thumbnails) {
      if (py > BOTTOM - 100) {
        doc.addPage();
        py = doc.y;
      }
      doc.image(t.image, px, py, { fit: [110, 82] });
      doc
        .font(FONT.body)
        .fontSize(6)
        .fillColor(COLOURS.muted)
        .text(t.caption, px, py + 84, { width: 110, height: 16, ellipsis: true });
      px += 122;
      if (px > PAGE_W - M - 110) {
        px = M;
        py += 104;
      }
    }
    doc.x = M;
    doc.y = px === M ? py : py + 104;
  }
}

/** The return's evidence pack: plan, counts, readings, drawings, photos, decision, chargeback. */
export function evidencePackPdf(data: EvidencePackData): Promise<Buffer> {
  return renderPdf(
    { size: 'A4', margin: M, info: { Title: `Evidence pack ${data.number}` } },
    (doc) => {
      doc.rect(0, 0, PAGE_W, 70).fill(COLOURS.rejected);
      doc
        .font(FONT.bold)
        .fontSize(20)
        .fillColor('#FFFFFF')
        .text(`Return to vendor ${data.number}`, M, 18);
      doc.font(FONT.body).fontSize(10).text(`Evidence pack · ${data.supplier}`, M, 44);
      doc.y = 84;
      doc.font(FONT.body).fontSize(9).fillColor(COLOURS.ink);
      doc.text(
        `Status: ${data.status}    RMA: ${data.rmaNumber ?? 'not given yet'}    Raised: ${paperDate(data.createdAt)}`,
        M,
      );
      heading(doc, 'Chargeback');
      doc.font(FONT.body).fontSize(9).fillColor(COLOURS.ink);
      for (const line of data.chargeback) doc.text(line, M);
      for (const lot of data.lots) lotSection(doc, lot);
      heading(doc, 'Safety caution');
      doc.font(FONT.body).fontSize(8.5).fillColor(COLOURS.ink);
      doc.text(
        'Undersized or aluminium conductors drop more voltage and run hotter than the label promises; a fuse sized for the label may not protect them.',
        M,
      );
      for (const c of data.cautions) doc.text(`• ${c}`, M);
    },
  );
}
