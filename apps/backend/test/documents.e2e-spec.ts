import { execFileSync } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { evidencePackPdf } from '../src/documents/evidence-pack';
import { Product } from '../src/products/entities/product.entity';
import { auth } from './helpers/api';
import { Fixtures, startWithFixtures } from './helpers/decision-fixtures';
import { collect, pdfFile as writePdf } from './helpers/pdf';
import { DEMO, type TestApp } from './helpers/test-app';

/**
 * Documents in any script (issue 17 item 9): every PDF embeds a Unicode font, and the tag's
 * fields wrap inside their boxes. Read back through poppler's pdftotext.
 */
let t: TestApp;
let fx: Fixtures;
let qa: string;
beforeAll(async () => ({ t, fx, token: qa } = await startWithFixtures(DEMO.qa)));
afterAll(async () => t.close());

const pdfFile = (pdf: Buffer) => writePdf(process.env.KEEP_DOCS ?? t.dir, pdf);
const pdfText = (pdf: Buffer) =>
  execFileSync('pdftotext', ['-layout', pdfFile(pdf), '-'])
    .toString()
    .replace(/\s+/g, ' ');

interface Word {
  text: string;
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}
/**
 * Pairs of words whose boxes overlap by more than a hair (0.5 pt: glyph boxes of
 * neighbouring lines touch), as "a / b".
 */
function overlapsOf(words: Word[]): string[] {
  const overlaps: string[] = [];
  for (let i = 0; i < words.length; i++) {
    for (let j = i + 1; j < words.length; j++) {
      const a = words[i];
      const b = words[j];
      const dx = Math.min(a.x1, b.x1) - Math.max(a.x0, b.x0);
      const dy = Math.min(a.y1, b.y1) - Math.max(a.y0, b.y0);
      if (dx > 0.5 && dy > 0.5) overlaps.push(`${a.text} / ${b.text}`);
    }
  }
  return overlaps;
}

/** Every word with its box, from pdftotext -bbox. */
function pdfWords(pdf: Buffer): { page: { w: number; h: number }; words: Word[] } {
  const html = execFileSync('pdftotext', ['-bbox', pdfFile(pdf), '-']).toString();
  const page = /<page width="([\d.]+)" height="([\d.]+)"/.exec(html)!;
  const words = [
    ...html.matchAll(
      /<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g,
    ),
  ].map((m) => ({ x0: +m[1], y0: +m[2], x1: +m[3], y1: +m[4], text: m[5] }));
  return { page: { w: +page[1], h: +page[2] }, words };
}

// Invented names in three scripts; the letters are those each language adds to the basic
// Latin or uses instead of it (ą ć ę ł ń ó ś ź ż; Cyrillic; Greek).
const POLISH = 'Przewód zasilający 4 AWG, miedź — zażółć gęślą jaźń';
const CYRILLIC = 'Северный кабельный завод';
const GREEK = 'ΠΑΡ-Ωμέγα-17';

async function tagOf(lotId: number): Promise<Buffer> {
  const res = await t.http
    .get(`/api/lots/${lotId}/tag.pdf`)
    .set(auth(qa))
    .buffer(true)
    .parse(collect);
  expect(res.status).toBe(200);
  return res.body as Buffer;
}

describe('documents in any script', () => {
  it('prints Polish, Cyrillic and Greek on the tag, and the ASCII around them intact', async () => {
    const supplier = await fx.supplier(CYRILLIC, 'zakaz@kabel.example');
    const product = await fx.product(supplier.id);
    const em = fx.em();
    await em.nativeUpdate(Product, product.id, { description: POLISH });
    const { lot } = await fx.lot(product.id, { poNumber: GREEK });
    const pdf = await tagOf(lot.id);
    const text = pdfText(pdf);
    expect(text).toContain(POLISH);
    expect(text).toContain(CYRILLIC);
    expect(text).toContain(GREEK);
    expect(text).toContain(`LOT ${lot.id}`);
    // The font is in the file, not a reference to one the reader may lack.
    const fonts = execFileSync('pdffonts', [pdfFile(pdf)]).toString();
    expect(fonts).toMatch(/DejaVuSans\S*\s+CID TrueType/);
    expect(fonts).not.toMatch(/Helvetica/);
  });

  it('wraps long texts inside their fields on the tag: no word overlaps another or leaves the label', async () => {
    const long = 'Долгое название поставщика кабельной продукции и проводов '.repeat(3).trim();
    const supplier = await fx.supplier(long.slice(0, 160), 'long@kabel.example');
    const product = await fx.product(supplier.id, `SKU-${'W'.repeat(50)}`);
    const em = fx.em();
    await em.nativeUpdate(Product, product.id, {
      description: `${POLISH}; ${'bardzo długi opis przewodu '.repeat(12)}`.slice(0, 300),
    });
    const { lot } = await fx.lot(product.id, { poNumber: `PO-${'9'.repeat(60)}` });
    const { page, words } = pdfWords(await tagOf(lot.id));
    expect(words.length).toBeGreaterThan(20);
    for (const w of words) {
      expect(w.x0).toBeGreaterThanOrEqual(0);
      expect(w.y0).toBeGreaterThanOrEqual(0);
      expect(w.x1).toBeLessThanOrEqual(page.w);
      expect(w.y1).toBeLessThanOrEqual(page.h);
    }
    const overlaps = overlapsOf(words);
    expect(overlaps).toEqual([]);
    // The supplier starts in its field, the fields after it are all there.
    const text = words.map((w) => w.text).join(' ');
    expect(text).toContain('Долгое название');
    for (const name of ['RECEIVED', 'NCR', 'DECISION']) expect(text).toContain(name);
  });

  it("prints a concession tag's title whole, nothing overlapping", async () => {
    const supplier = await fx.supplier('Harbourlight Cable Works', 'tags@harbourlight.example');
    const product = await fx.product(supplier.id);
    const { lot } = await fx.lot(product.id, { status: 'accepted_on_concession' });
    const { words } = pdfWords(await tagOf(lot.id));
    const text = words.map((w) => w.text).join(' ');
    // "CONCESSION" is one word on one line, never "CONCESSIO" over "N"
    expect(words.map((w) => w.text)).toContain('CONCESSION');
    expect(words.map((w) => w.text)).not.toContain('CONCESSIO');
    expect(text).toContain('Use only as the concession allows');
    const overlaps = overlapsOf(words);
    expect(overlaps).toEqual([]);
  });

  it('prints any script in the evidence pack', async () => {
    const pdf = await evidencePackPdf({
      number: 'RTV-0001',
      documentNumber: 'RTV-0001-EP1',
      issuedAt: new Date('2026-11-04T09:00:00Z'),
      paper: 'A4',
      supplier: CYRILLIC,
      status: 'Draft: not yet sent to the supplier',
      rmaNumber: GREEK,
      raisedAt: new Date('2026-11-03T14:05:00Z'),
      supplierNote: `${POLISH}`,
      chargeback: [['Other', `EUR 10.00, ${POLISH}`]],
      total: 'EUR 10.00',
      lots: [
        {
          title: `Lot 1 · ${POLISH}`,
          facts: [['PO', 'PO-1']],
          plan: 'S-3, AQL 2.5, code letter D, 8 units',
          counts: '8 of 8 units tested, 1 nonconforming',
          decision: `Rejected by Ωμέγα Δοκιμή`,
          sections: [],
          disagreements: [],
          consequences: [],
          readings: [
            {
              id: 1,
              unit: 'Unit 1',
              conductor: 'power',
              label: '4 AWG',
              method: 'Solid diameter',
              inputs: 'diameter 5.19 mm',
              instruments: '',
              result: '21.15 ± 0.24 mm²',
              coverage: 'k = 2',
              ofNominal: '100.0 %',
              measuresAs: '4 AWG',
              material: 'copper',
              verdict: 'conforms',
              voided: false,
              voidReason: null,
              confirmedUnusual: false,
              takenAt: '2026-11-03 14:05 UTC',
              reasons: [],
              budget: [],
              budgetSummary: '',
            },
          ],
          thumbnails: [],
        },
      ],
      cautions: [],
    });
    const text = pdfText(pdf);
    for (const want of [`Evidence pack for ${CYRILLIC}`, GREEK, POLISH, 'Ωμέγα Δοκιμή', '4 AWG']) {
      expect(text).toContain(want);
    }
  });
});
