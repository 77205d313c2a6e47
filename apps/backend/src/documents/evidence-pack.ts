import {
  CROSS_SECTION_HEIGHT,
  drawCrossSections,
  drawMetalLegend,
  type CrossSection,
} from './cross-section';
import { COLOURS, FONT, paperDate, renderPdf, type Pdf } from './pdf';

/** One line of a reading's uncertainty budget, as printed (GUM 8: the budget in full). */
export interface EvidenceBudgetLine {
  name: string;
  /** The input's value with its unit. */
  value: string;
  /** u(xᵢ), two significant figures, with its unit. */
  u: string;
  /** The exponent pᵢ of the input in the product model. */
  sensitivity: string;
  /** |pᵢ|·u(xᵢ)/xᵢ as a percentage. */
  share: string;
  note: string;
}

export interface EvidenceReading {
  id: number;
  unit: string;
  conductor: string;
  label: string;
  /** The method in words ("Mass and length", "Resistance, four-wire"). */
  method: string;
  /** The raw inputs in words with their units. */
  inputs: string;
  instruments: string;
  /** "8.40 ± 0.24 mm²": U to two significant figures, the area to the same place (GUM 7.2.6). */
  result: string;
  coverage: string;
  /** "39.7 %" of the label's nominal area. */
  ofNominal: string;
  /** The one "measures as" (issue 13). */
  measuresAs: string;
  material: string;
  verdict: string;
  voided: boolean;
  voidReason: string | null;
  confirmedUnusual: boolean;
  takenAt: string;
  reasons: string[];
  budget: EvidenceBudgetLine[];
  /** Combined relative u, U and what was treated as exact. */
  budgetSummary: string;
}

export interface EvidenceLot {
  title: string;
  /** Name → value pairs under the title: PO, supplier lot code, packing slip, received … */
  facts: [string, string][];
  plan: string;
  counts: string;
  decision: string;
  sections: CrossSection[];
  /** Samples whose two readings disagree by more than their combined U (issue 13). */
  disagreements: string[];
  /** The installer's consequence of each short conductor ("Treat as 8 AWG …"). */
  consequences: string[];
  readings: EvidenceReading[];
  thumbnails: { image: Buffer; caption: string }[];
}

export type Paper = 'A4' | 'LETTER';

export interface EvidencePackData {
  /** The return's number (RTV-…). */
  number: string;
  /** The document's own number: the return's, its revision and "EP". */
  documentNumber: string;
  issuedAt: Date;
  paper: Paper;
  supplier: string;
  /** "Notice e-mailed 2026-12-03 14:05 UTC", never "draft" once the mail has left. */
  status: string;
  rmaNumber: string | null;
  raisedAt: Date;
  /** What purchasing writes to the supplier about why the goods come back. */
  supplierNote: string | null;
  chargeback: [string, string][];
  total: string;
  lots: EvidenceLot[];
  cautions: readonly string[];
}

const M = 40;
/** Space kept below the last line for the running footer. */
const FOOTER = 28;

/** Page geometry of the pack, from the paper chosen. */
interface Frame {
  width: number;
  bottom: number;
  inner: number;
}

function frame(doc: Pdf): Frame {
  return {
    width: doc.page.width,
    bottom: doc.page.height - M - FOOTER,
    inner: doc.page.width - 2 * M,
  };
}

/** A page break when fewer than `need` points are left. */
function room(doc: Pdf, need: number) {
  if (doc.y + need > frame(doc).bottom) doc.addPage();
}

function heading(doc: Pdf, text: string, size = 12) {
  room(doc, 60);
  const f = frame(doc);
  doc
    .moveDown(0.6)
    .font(FONT.bold)
    .fontSize(size)
    .fillColor(COLOURS.ink)
    .text(text, M, doc.y, { width: f.inner });
  doc
    .moveTo(M, doc.y + 2)
    .lineTo(f.width - M, doc.y + 2)
    .lineWidth(0.5)
    .stroke(COLOURS.rule);
  doc.moveDown(0.4);
}

function para(doc: Pdf, text: string, size = 8.5, colour: string = COLOURS.ink, bold = false) {
  const f = frame(doc);
  doc.font(bold ? FONT.bold : FONT.body).fontSize(size);
  room(doc, doc.heightOfString(text, { width: f.inner }) + 2);
  doc.fillColor(colour).text(text, M, doc.y, { width: f.inner });
}

/** Name: value lines in two columns. */
function facts(doc: Pdf, pairs: [string, string][]) {
  const f = frame(doc);
  const colW = f.inner / 2;
  for (let i = 0; i < pairs.length; i += 2) {
    room(doc, 12);
    const y = doc.y;
    pairs.slice(i, i + 2).forEach(([name, value], j) => {
      doc
        .font(FONT.body)
        .fontSize(7)
        .fillColor(COLOURS.muted)
        .text(`${name}:`, M + j * colW, y + 1, { width: 78, lineBreak: false });
      doc
        .font(FONT.bold)
        .fontSize(8.5)
        .fillColor(COLOURS.ink)
        .text(value, M + j * colW + 80, y, {
          width: colW - 84,
          height: 11,
          ellipsis: true,
          lineBreak: false,
        });
    });
    doc.y = y + 12;
  }
  doc.x = M;
}

interface Column {
  header: string;
  /** Share of the table's width. */
  share: number;
}

/** A table whose rows grow to hold their wrapped cells; the header repeats on a new page. */
function table(
  doc: Pdf,
  columns: Column[],
  rows: { cells: string[]; colour?: string; bold?: boolean }[],
  size = 7,
) {
  const f = frame(doc);
  const widths = columns.map((c) => c.share * f.inner);
  const line = (cells: string[], colour: string, bold: boolean) => {
    doc.font(bold ? FONT.bold : FONT.body).fontSize(size);
    const h =
      Math.max(...cells.map((c, i) => doc.heightOfString(c || ' ', { width: widths[i] - 4 }))) + 3;
    return {
      h,
      draw: (y: number) => {
        let x = M;
        doc
          .font(bold ? FONT.bold : FONT.body)
          .fontSize(size)
          .fillColor(colour);
        cells.forEach((c, i) => {
          doc.text(c, x, y, { width: widths[i] - 4 });
          x += widths[i];
        });
        doc
          .moveTo(M, y + h - 1.5)
          .lineTo(M + f.inner, y + h - 1.5)
          .lineWidth(0.3)
          .stroke(COLOURS.rule);
      },
    };
  };
  const header = () => {
    const hl = line(
      columns.map((c) => c.header),
      COLOURS.muted,
      true,
    );
    const y = doc.y;
    hl.draw(y);
    doc.y = y + hl.h;
  };
  room(doc, 40);
  header();
  for (const r of rows) {
    const l = line(r.cells, r.colour ?? COLOURS.ink, r.bold ?? false);
    if (doc.y + l.h > frame(doc).bottom) {
      doc.addPage();
      header();
    }
    // Drawing moves doc.y to the end of the last cell: the row's own height counts.
    const y = doc.y;
    l.draw(y);
    doc.y = y + l.h;
  }
  doc.x = M;
}

const READING_COLUMNS: Column[] = [
  { header: 'No.', share: 0.06 },
  { header: 'Unit · conductor', share: 0.11 },
  { header: 'Method', share: 0.1 },
  { header: 'Inputs', share: 0.2 },
  { header: 'Area ± U (mm²)', share: 0.13 },
  { header: 'Of nominal', share: 0.07 },
  { header: 'Measures as', share: 0.1 },
  { header: 'Metal found', share: 0.1 },
  { header: 'Verdict', share: 0.13 },
];

function readingColour(r: EvidenceReading) {
  if (r.voided) return COLOURS.muted;
  return r.verdict === 'nonconforming' ? COLOURS.rejected : COLOURS.ink;
}

function readingsTable(doc: Pdf, readings: EvidenceReading[]) {
  table(
    doc,
    READING_COLUMNS,
    readings.map((r) => ({
      colour: readingColour(r),
      cells: [
        String(r.id),
        `${r.unit} · ${r.conductor} ${r.label}`,
        r.method,
        r.inputs,
        `${r.result} (${r.coverage})`,
        r.ofNominal,
        r.measuresAs,
        r.material,
        [
          r.voided ? `${r.verdict}, voided: ${r.voidReason ?? ''}` : r.verdict,
          r.confirmedUnusual ? 'unusual, confirmed by the inspector' : '',
        ]
          .filter(Boolean)
          .join('; '),
      ],
    })),
  );
}

const BUDGET_COLUMNS: Column[] = [
  { header: 'Component', share: 0.2 },
  { header: 'Value', share: 0.12 },
  { header: 'u(xᵢ)', share: 0.11 },
  { header: 'pᵢ', share: 0.05 },
  { header: 'Share of u(y)/y', share: 0.1 },
  { header: 'How it was obtained', share: 0.42 },
];

function budgets(doc: Pdf, readings: EvidenceReading[]) {
  for (const r of readings) {
    room(doc, 90);
    doc.moveDown(0.4);
    para(
      doc,
      `Reading ${r.id} · ${r.unit} · ${r.conductor} ${r.label} · ${r.method} · ${r.result} (${r.coverage}) · measures as ${r.measuresAs} · ${r.voided ? 'voided' : r.verdict}`,
      8,
      readingColour(r),
      true,
    );
    para(
      doc,
      `Inputs: ${r.inputs}. Instruments: ${r.instruments || 'none recorded'}. Taken ${r.takenAt}.`,
      7,
      COLOURS.muted,
    );
    for (const reason of r.reasons) para(doc, `• ${reason}`, 7);
    if (r.budget.length) {
      doc.moveDown(0.2);
      table(
        doc,
        BUDGET_COLUMNS,
        r.budget.map((b) => ({
          cells: [b.name, b.value, b.u, b.sensitivity, b.share, b.note],
        })),
        6.5,
      );
    }
    para(doc, r.budgetSummary, 7, COLOURS.muted);
  }
}

function lotSection(doc: Pdf, lot: EvidenceLot) {
  doc.addPage();
  heading(doc, lot.title, 13);
  facts(doc, lot.facts);
  doc.moveDown(0.3);
  para(doc, `Sampling plan: ${lot.plan}`);
  para(doc, `Counts: ${lot.counts}`);
  para(doc, `Decision: ${lot.decision}`, 8.5, COLOURS.ink, true);

  if (lot.sections.length) {
    heading(doc, 'The worst conductor of each kind, to scale', 10);
    const f = frame(doc);
    const boxW = f.inner / 2;
    let i = 0;
    for (const s of lot.sections) {
      if (i % 2 === 0) room(doc, CROSS_SECTION_HEIGHT + 24);
      const y = doc.y;
      drawCrossSections(doc, M + (i % 2) * boxW, y, boxW - 10, s);
      doc.y = y;
      if (i % 2 === 1 || i === lot.sections.length - 1) doc.y = y + CROSS_SECTION_HEIGHT;
      i++;
    }
    doc.y = drawMetalLegend(doc, M, doc.y, f.inner);
    para(
      doc,
      'Discs of equal area to scale, coloured by the metal claimed (left) and found (right); copper-clad aluminium is drawn with a 10 % copper skin. Real strands fill less of a circle; the areas are what count.',
      6.5,
      COLOURS.muted,
    );
  }
  for (const d of lot.disagreements) para(doc, `Two methods disagree: ${d}`, 8, COLOURS.rejected);
  for (const c of lot.consequences) para(doc, c, 8, COLOURS.rejected);

  heading(doc, 'Every reading, with its expanded uncertainty', 10);
  readingsTable(doc, lot.readings);

  if (lot.thumbnails.length) {
    room(doc, 150); // the heading with a row of photos under it
    heading(doc, 'Photos', 10);
    const f = frame(doc);
    let px = M;
    let py = doc.y + 2;
    for (const t of lot.thumbnails) {
      if (py + 104 > f.bottom) {
        doc.addPage();
        py = doc.y;
        px = M;
      }
      doc.image(t.image, px, py, { fit: [110, 82] });
      doc
        .font(FONT.body)
        .fontSize(6)
        .fillColor(COLOURS.muted)
        .text(t.caption, px, py + 84, { width: 110, height: 16, ellipsis: true });
      px += 122;
      if (px > f.width - M - 110) {
        px = M;
        py += 104;
      }
    }
    doc.x = M;
    doc.y = px === M ? py : py + 104;
  }

  heading(doc, 'Uncertainty budget of each reading (GUM)', 10);
  para(
    doc,
    'Each input enters with its standard uncertainty u(xᵢ): resolution δ/√12, stated accuracy a/√3, calibration U/2 from the certificate, the cut length at both ends, the temperature difference for resistance, the spread of repeated strand diameters (Type A). The area is a product of powers of the inputs, so its relative standard uncertainty is √Σ(pᵢ·u(xᵢ)/xᵢ)² (GUM 5.1.6); U = k·u.',
    7,
    COLOURS.muted,
  );
  budgets(doc, lot.readings);
}

/**
 * The return's evidence pack, written for the supplier's quality department: the document's
 * number and date, the return and its status, the note to the supplier, the chargeback with
 * its currency; then each lot on a page of its own: its papers, the plan and counts, the
 * decision, drawings coloured by the metal found, every reading with one size name and its
 * inputs in words, photos, and every reading's full uncertainty budget.
 */
export function evidencePackPdf(data: EvidencePackData): Promise<Buffer> {
  return renderPdf(
    {
      size: data.paper,
      margin: M,
      info: { Title: `Evidence pack ${data.documentNumber}`, Subject: data.number },
    },
    (doc) => {
      let page = 1;
      const footer = () => {
        const f = frame(doc);
        const keep = { x: doc.x, y: doc.y, bottom: doc.page.margins.bottom };
        doc.page.margins.bottom = 0;
        doc
          .font(FONT.body)
          .fontSize(7)
          .fillColor(COLOURS.muted)
          .text(
            `Evidence pack ${data.documentNumber} · ${data.number} · issued ${paperDate(data.issuedAt)} · page ${page}`,
            M,
            doc.page.height - M - 10,
            { width: f.inner, align: 'center', lineBreak: false },
          );
        doc.page.margins.bottom = keep.bottom;
        doc.x = keep.x;
        doc.y = keep.y;
      };
      footer();
      doc.on('pageAdded', () => {
        page += 1;
        footer();
      });

      const f = frame(doc);
      doc.rect(0, 0, f.width, 70).fill(COLOURS.rejected);
      doc
        .font(FONT.bold)
        .fontSize(20)
        .fillColor('#FFFFFF')
        .text(`Return to vendor ${data.number}`, M, 16, { width: f.inner, lineBreak: false });
      doc.font(FONT.body).fontSize(10).text(`Evidence pack for ${data.supplier}`, M, 44, {
        width: f.inner,
        height: 14,
        ellipsis: true,
        lineBreak: false,
      });
      doc.y = 82;
      facts(doc, [
        ['Document', data.documentNumber],
        ['Issued', paperDate(data.issuedAt)],
        ['Your RMA', data.rmaNumber ?? 'not given yet'],
        ['Return raised', paperDate(data.raisedAt)],
      ]);
      // Its own line: a status with its date and carrier is longer than a field.
      para(doc, `Status: ${data.status}`, 9, COLOURS.ink, true);
      para(doc, `Lots on this return: ${data.lots.length}`, 8.5);
      if (data.supplierNote) {
        heading(doc, 'Note to the supplier');
        para(doc, data.supplierNote, 9);
      }
      heading(doc, 'Chargeback');
      facts(doc, data.chargeback);
      para(doc, `Total chargeback: ${data.total}`, 10, COLOURS.ink, true);

      heading(doc, 'How to read this pack');
      para(
        doc,
        'Each lot follows on its own pages. A reading gives the conductor area with its expanded uncertainty U (k = 2 unless stated; U to two significant figures and the area to the same decimal place, GUM 7.2.6), the share of the label’s nominal area, and one size name: the largest standard size the conductor meets (AWG: 98 % of its nominal area, ASTM B496 / B258; metric copper: IEC 60228’s maximum resistance at 20 °C). A verdict is conclusive only when the limit lies outside the result ± U (ILAC-G8 guard band). The full uncertainty budget of every reading closes each lot.',
        8,
      );
      for (const lot of data.lots) lotSection(doc, lot);

      heading(doc, 'Safety caution');
      para(
        doc,
        'Undersized or aluminium conductors drop more voltage and run hotter than the label promises; a fuse sized for the label may not protect them.',
      );
      for (const c of data.cautions) para(doc, `• ${c}`);
    },
  );
}
