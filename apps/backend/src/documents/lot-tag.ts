import QRCode from 'qrcode';
import type { LotStatus } from '../lots/entities/lot.entity';
import { COLOURS, fitText, label, paperDate, renderPdf } from './pdf';

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
  /** The terms of the concession in force (accepted on concession only). */
  concession?: {
    scope: string;
    quantity: string;
    expiresOn: string;
    approvedBy: string;
  } | null;
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

/**
 * A printable 4 × 6 in tag for the lot's place on the shelf. Every field has a fixed box and its
 * text wraps (and shrinks, then is cut with an ellipsis) inside it, so a long supplier name or
 * description can never run over the next field.
 */
export async function lotTagPdf(data: LotTagData): Promise<Buffer> {
  const qr = await QRCode.toBuffer(data.url, { margin: 1, width: 240, errorCorrectionLevel: 'M' });
  const banner = tagBanner(data.status);
  return renderPdf({ size: [W, H], margin: 0, info: { Title: `Lot ${data.lotId} tag` } }, (doc) => {
    doc.rect(0, 0, W, 86).fill(banner.colour);
    fitText(doc, banner.word, 14, 14, W - 28, 44, {
      bold: true,
      size: 40,
      minSize: 20,
      colour: '#FFFFFF',
      align: 'center',
    });
    fitText(doc, banner.note, 14, 62, W - 28, 20, {
      size: 9,
      colour: '#FFFFFF',
      align: 'center',
    });
    doc
      .rect(8, 94, W - 16, H - 102)
      .lineWidth(2)
      .stroke(banner.colour);

    const x = 18;
    const full = W - 36;
    const col = full / 2;
    fitText(doc, `LOT ${data.lotId}`, x, 100, full, 26, { bold: true, size: 22, minSize: 12 });
    label(doc, x, 128, 'PO', data.poNumber, col);
    label(doc, x + col, 128, 'Status', data.status.replace(/_/g, ' '), col);
    label(doc, x, 155, 'Product', `${data.sku} · ${data.quantity}`, full);
    fitText(doc, data.description, x, 181, full, 22, { size: 8, minSize: 6 });
    label(doc, x, 204, 'Supplier', data.supplier, full);
    label(doc, x, 231, 'Received', paperDate(data.receivedAt), col);
    label(doc, x + col, 231, 'NCR', data.ncrNumber ?? '—', col);
    label(
      doc,
      x,
      258,
      'Decision',
      data.decision ? `${data.decision}, ${paperDate(data.decidedAt)}` : 'not decided yet',
      full,
      30,
    );

    if (data.concession) {
      // The terms take the lower part; the QR code moves to its corner.
      const c = data.concession;
      const terms = full - 96;
      fitText(doc, 'MAY BE USED ONLY FOR', x, 292, terms, 10, { bold: true, size: 7 });
      fitText(doc, c.scope, x, 303, terms, 52, { bold: true, size: 10, minSize: 6 });
      label(doc, x, 358, 'Quantity', c.quantity, terms / 2);
      label(doc, x + terms / 2, 358, 'Until', c.expiresOn, terms / 2);
      label(doc, x, 385, 'Approved by', c.approvedBy, terms);
      doc.image(qr, x + full - 88, 330, { width: 88 });
      fitText(doc, 'Scan for the lot', x + full - 88, 312, 88, 16, {
        size: 6,
        colour: COLOURS.muted,
        align: 'center',
      });
      return;
    }
    doc.image(qr, x, 294, { width: 120 });
    const side = full - 130;
    fitText(doc, 'Scan for the lot page, its readings and its history.', x + 130, 298, side, 26, {
      size: 7,
      colour: COLOURS.muted,
    });
    fitText(doc, data.url, x + 130, 326, side, 60, { size: 7, minSize: 5, colour: COLOURS.muted });
    fitText(doc, 'Gaugeproof receiving inspection', x + 130, 392, side, 18, {
      bold: true,
      size: 7,
    });
  });
}
