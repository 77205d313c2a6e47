import QRCode from 'qrcode';
import type { LotStatus } from '../lots/entities/lot.entity';
import { COLOURS, label, paperDate, renderPdf } from './pdf';

export interface LotTagData {
  lotId: number;
  status: LotStatus;
  poNumber: string;
  sku: string;
  description: string;
  supplier: string;
  receivedAt: Date;
  quantity: string;
  decision: string | null;
  decidedAt: Date | null;
  ncrNumber: string | null;
  url: string;
}

/** The big word on the tag and its colour, from the lot's status. */
export function tagBanner(status: LotStatus): { word: string; colour: string; note: string } {
  switch (status) {
    case 'accepted':
      return { word: 'ACCEPTED', colour: COLOURS.accepted, note: 'Released for use' };
    case 'accepted_on_concession':
      return {
        word: 'CONCESSION',
        colour: COLOURS.concession,
        note: 'Use only as the concession allows',
      };
    case 'rejected':
    case 'returned':
      return {
        word: 'REJECTED',
        colour: COLOURS.rejected,
        note: 'Do not use. Keep apart for return to the supplier',
      };
    default:
      return { word: 'HOLD', colour: COLOURS.hold, note: 'Do not use until the QA lead decides' };
  }
}

const W = 288; // 4 × 6 in label (common thermal label stock), points
const H = 432;

/** A printable 4 × 6 in tag for the lot's place on the shelf. */
export async function lotTagPdf(data: LotTagData): Promise<Buffer> {
  const qr = await QRCode.toBuffer(data.url, { margin: 1, width: 240, errorCorrectionLevel: 'M' });
  const banner = tagBanner(data.status);
  return renderPdf({ size: [W, H], margin: 0, info: { Title: `Lot ${data.lotId} tag` } }, (doc) => {
    doc.rect(0, 0, W, 86).fill(banner.colour);
    doc
      .font('Helvetica-Bold')
      .fontSize(40)
      .fillColor('#FFFFFF')
      .text(banner.word, 14, 14, { width: W - 28, align: 'center' });
    doc
      .font('Helvetica')
      .fontSize(9)
      .text(banner.note, 14, 62, { width: W - 28, align: 'center' });
    doc
      .rect(8, 94, W - 16, H - 102)
      .lineWidth(2)
      .stroke(banner.colour);

    const x = 18;
    const col = (W - 36) / 2;
    doc
      .font('Helvetica-Bold')
      .fontSize(22)
      .fillColor(COLOURS.ink)
      .text(`LOT ${data.lotId}`, x, 102);
    label(doc, x, 130, 'PO', data.poNumber, col);
    label(doc, x + col, 130, 'Status', data.status.replace(/_/g, ' '), col);
    label(doc, x, 156, 'Product', `${data.sku} · ${data.quantity}`, W - 36);
    doc
      .font('Helvetica')
      .fontSize(8)
      .fillColor(COLOURS.ink)
      .text(data.description, x, 180, { width: W - 36, height: 22, ellipsis: true });
    label(doc, x, 204, 'Supplier', data.supplier, W - 36);
    label(doc, x, 230, 'Received', paperDate(data.receivedAt), col);
    label(doc, x + col, 230, 'NCR', data.ncrNumber ?? '—', col);
    label(
      doc,
      x,
      256,
      'Decision',
      data.decision ? `${data.decision}, ${paperDate(data.decidedAt)}` : 'not decided yet',
      W - 36,
    );

    doc.image(qr, x, 290, { width: 120 });
    doc.font('Helvetica').fontSize(7).fillColor(COLOURS.muted);
    doc.text('Scan for the lot page, its readings and its history.', x + 130, 300, {
      width: W - 36 - 130,
    });
    doc.text(data.url, x + 130, 330, { width: W - 36 - 130 });
    doc.font('Helvetica-Bold').fontSize(7).fillColor(COLOURS.ink);
    doc.text('Gaugeproof receiving inspection', x + 130, 392, { width: W - 36 - 130 });
  });
}
