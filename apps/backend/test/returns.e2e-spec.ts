import { writeFileSync } from 'node:fs';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Jimp } from 'jimp';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { Decision } from '../src/decisions/entities/decision.entity';
import { Photo } from '../src/photos/entities/photo.entity';
import { StorageService } from '../src/storage/storage.service';
import { User } from '../src/users/entities/user.entity';
import { auth } from './helpers/api';
import { Fixtures, rejectedLot, startWithFixtures } from './helpers/decision-fixtures';
import { collect, pdfTool as runPdfTool } from './helpers/pdf';
import { DEMO, ORIGIN, type TestApp } from './helpers/test-app';

let t: TestApp;
let fx: Fixtures;
let buyer: string;
beforeAll(async () => ({ t, fx, token: buyer } = await startWithFixtures(DEMO.buyer)));
afterAll(async () => t.close());

const pdfTool = (tool: string, pdf: Buffer, args: string[] = []) =>
  runPdfTool(t.dir, tool, pdf, args);
function parseCsv(text: string): string[][] {
  expect(text.startsWith('\ufeff')).toBe(true);
  return Papa.parse<string[]>(text.slice(1).trim(), { newline: '\r\n' }).data;
}

async function supplierWithRejects(name = 'Riverbend Conductors', lots = 1) {
  const supplier = await fx.supplier(name, 'returns@riverbend.example');
  const product = await fx.product(supplier.id);
  const rejected = [];
  for (let i = 0; i < lots; i++) rejected.push(await rejectedLot(t, fx, product.id));
  return {
    supplier,
    product,
    lots: rejected.map((r) => r.lot),
    ncrs: rejected.map((r) => r.ncrNumber),
  };
}

async function createReturn(lotIds: number[], extra: Record<string, unknown> = {}) {
  return t.http
    .post('/api/returns')
    .set(auth(buyer))
    .send({ lotIds, ...extra });
}

describe('POST /api/returns', () => {
  it('raises a numbered draft return of rejected lots with its chargeback', async () => {
    const { supplier, lots } = await supplierWithRejects('Riverbend Conductors', 2);
    const res = await createReturn(
      lots.map((l) => l.id),
      {
        rmaNumber: ' RMA-5521 ',
        costs: { inspectionHours: 2.5, hourlyRate: 48, freight: 35.2, other: 10 },
      },
    );
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      status: 'draft',
      rmaNumber: 'RMA-5521',
      supplier: { id: supplier.id, contactEmail: 'returns@riverbend.example' },
      chargebackTotal: 165.2, // 2.5 h × 48 + 35.20 + 10
      createdBy: { name: expect.any(String) },
    });
    expect(res.body.number).toMatch(new RegExp(`^RTV-${new Date().getUTCFullYear()}-\\d{4}$`));
    expect(res.body.lots.map((l: { id: number }) => l.id)).toEqual(lots.map((l) => l.id));
  });

  it('refuses lots that are not rejected, of two suppliers, already on an open return, or unknown', async () => {
    const a = await supplierWithRejects('Coastline Cable Co');
    const b = await supplierWithRejects('Summit Wire Partners');
    const { lot: accepted } = await fx.lot(a.product.id, { status: 'accepted' });
    const notRejected = await createReturn([a.lots[0].id, accepted.id]);
    expect(notRejected.status).toBe(422);
    expect(notRejected.body.message).toMatch(new RegExp(`lot ${accepted.id} is accepted`));
    const mixed = await createReturn([a.lots[0].id, b.lots[0].id]);
    expect(mixed.status).toBe(422);
    expect(mixed.body.message).toMatch(/one supplier/);
    expect((await createReturn([a.lots[0].id])).status).toBe(201);
    const twice = await createReturn([a.lots[0].id]);
    expect(twice.status).toBe(422);
    expect(twice.body.message).toMatch(/already on an open return: RTV-/);
    expect((await createReturn([987654])).status).toBe(422);
    const bad = await createReturn([], { costs: { freight: -1 } });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toEqual(
      expect.arrayContaining([
        'lotIds must name at least one lot',
        'costs.freight cannot be negative',
      ]),
    );
  });
});

describe('GET and PATCH /api/returns', () => {
  const step = (id: number, name: string, body: Record<string, unknown> = {}) =>
    t.http.post(`/api/returns/${id}/${name}`).set(auth(buyer)).send(body);

  it('moves draft → shipped → acknowledged → credited → closed, returning the lots, refusing skips with 422', async () => {
    const { lots } = await supplierWithRejects('Lakeshore Harness Supply');
    const created = (await createReturn([lots[0].id])).body;
    expect(created).toMatchObject({ version: 1, currency: 'USD' }); // CURRENCY unset: USD
    const skip = await step(created.id, 'acknowledge');
    expect(skip.status).toBe(422);
    expect(skip.body.message).toMatch(
      /is draft: it can go on to notice e-mailed or shipped or cancelled, not acknowledged/,
    );
    const edited = await t.http
      .patch(`/api/returns/${created.id}`)
      .set(auth(buyer))
      .send({ version: 1, costs: { other: 12.5 }, currency: 'EUR' });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ version: 2, chargebackTotal: 12.5, currency: 'EUR' });
    const badShip = await step(created.id, 'ship', { carrier: 'X', shippedOn: '2026-02-30' });
    expect(badShip.status).toBe(400);
    expect(badShip.body.message).toEqual(
      expect.arrayContaining([
        'carrier must be at least 2 characters',
        'quantity must be a number',
      ]),
    );
    const shipped = await step(created.id, 'ship', {
      version: 2,
      carrier: 'Northline Freight',
      trackingNumber: 'NF 4471 2200',
      shippedOn: '2026-11-30',
      quantity: 5,
    });
    expect(shipped.status).toBe(200);
    expect(shipped.body).toMatchObject({
      status: 'shipped',
      version: 3,
      shipment: {
        carrier: 'Northline Freight',
        trackingNumber: 'NF 4471 2200',
        shippedOn: '2026-11-30',
        quantity: 5,
      },
      lots: [{ id: lots[0].id, status: 'returned' }],
    });
    const costsLate = await t.http
      .patch(`/api/returns/${created.id}`)
      .set(auth(buyer))
      .send({ version: 3, costs: { other: 1 } });
    expect(costsLate.status).toBe(422);
    expect(costsLate.body.message).toMatch(/the costs can change only while it is a draft/);
    const cancelLate = await step(created.id, 'cancel', { reason: 'changed our mind' });
    expect(cancelLate.status).toBe(422);
    expect((await step(created.id, 'acknowledge', { rmaNumber: 'RMA-77' })).body).toMatchObject({
      status: 'acknowledged',
      rmaNumber: 'RMA-77',
    });
    const credited = await step(created.id, 'credit', {
      creditNoteNumber: 'CN-20931',
      creditAmount: 12.5,
    });
    expect(credited.body).toMatchObject({
      status: 'credited',
      credit: { creditNoteNumber: 'CN-20931', amount: 12.5 },
    });
    expect((await step(created.id, 'close')).body.status).toBe('closed');
    const closed = await t.http
      .patch(`/api/returns/${created.id}`)
      .set(auth(buyer))
      .send({ version: 6, notes: 'late note' });
    expect(closed.status).toBe(422);
    const timeline = await t.http.get(`/api/lots/${lots[0].id}/timeline`).set(auth(buyer));
    const actions = timeline.body.map((e: { action: string }) => e.action);
    expect(actions).toEqual(
      expect.arrayContaining([
        'return.create',
        'return.update',
        'lot.returned',
        'return.ship',
        'return.acknowledge',
        'return.credit',
        'return.close',
      ]),
    );
  });

  it('edits the lots of a draft, and a cancelled draft frees its lots and leaves the scorecard', async () => {
    const { supplier, lots } = await supplierWithRejects('Millbrook Wire Traders', 3);
    const other = await supplierWithRejects('Quarry Lane Cables');
    const ret = (await createReturn([lots[0].id, lots[1].id], { costs: { other: 40 } })).body;
    const foreign = await t.http
      .patch(`/api/returns/${ret.id}`)
      .set(auth(buyer))
      .send({ version: 1, lotIds: [lots[0].id, other.lots[0].id] });
    expect(foreign.status).toBe(422);
    const swapped = await t.http
      .patch(`/api/returns/${ret.id}`)
      .set(auth(buyer))
      .send({ version: 1, lotIds: [lots[0].id, lots[2].id] });
    expect(swapped.status).toBe(200);
    expect(swapped.body.lots.map((l: { id: number }) => l.id)).toEqual([lots[0].id, lots[2].id]);
    // The lot taken off is free for another return; the one put on is taken.
    expect((await createReturn([lots[2].id])).status).toBe(422);
    const freed = await createReturn([lots[1].id]);
    expect(freed.status).toBe(201);
    await step(freed.body.id, 'cancel', { reason: 'raised by mistake' });

    const noReason = await step(ret.id, 'cancel', { reason: '' });
    expect(noReason.status).toBe(400);
    expect(noReason.body.message).toEqual(['reason must be at least 5 characters']);
    const cancelled = await step(ret.id, 'cancel', { version: 2, reason: 'Wrong lots ticked' });
    expect(cancelled.status).toBe(200);
    expect(cancelled.body).toMatchObject({
      status: 'cancelled',
      cancelReason: 'Wrong lots ticked',
      lots: [{ status: 'rejected' }, { status: 'rejected' }],
    });
    expect(
      (await step(ret.id, 'ship', { carrier: 'Any', shippedOn: '2026-11-30', quantity: 1 })).status,
    ).toBe(422);
    const again = await createReturn([lots[0].id, lots[1].id, lots[2].id], { costs: { other: 7 } });
    expect(again.status).toBe(201);
    const card = await t.http.get(`/api/suppliers/${supplier.id}/scorecard`).set(auth(buyer));
    expect(card.status).toBe(200);
    // The two cancelled returns (40, 0) count nowhere.
    expect(card.body.chargebacks).toEqual([{ currency: 'USD', amount: 7 }]);
  });

  it('sorts the list by chargeback within each currency, never one amount against another currency', async () => {
    const { supplier, lots } = await supplierWithRejects('Saltmarsh Conductors', 4);
    const raised: [number, string][] = [
      [100, 'USD'],
      [50, 'EUR'],
      [200, 'EUR'],
      [20, 'USD'],
    ];
    for (const [i, [other, currency]] of raised.entries()) {
      const res = await createReturn([lots[i].id], { costs: { other }, currency });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
    }
    const order = async (dir: string) =>
      (
        await t.http
          .get(`/api/returns?supplierId=${supplier.id}&sort=chargebackTotal:${dir}`)
          .set(auth(buyer))
      ).body.items.map((r: { currency: string; chargebackTotal: number }) =>
        [r.currency, r.chargebackTotal].join(' '),
      );
    expect(await order('desc')).toEqual(['EUR 200', 'EUR 50', 'USD 100', 'USD 20']);
    expect(await order('asc')).toEqual(['EUR 50', 'EUR 200', 'USD 20', 'USD 100']);
  });

  it('answers a stale edit and a stale step with 409 and the return as it is now', async () => {
    const { lots } = await supplierWithRejects('Oakridge Conductor Co');
    const ret = (await createReturn([lots[0].id])).body;
    const first = await t.http
      .patch(`/api/returns/${ret.id}`)
      .set(auth(buyer))
      .send({ version: 1, notes: 'first' });
    expect(first.status).toBe(200);
    const second = await t.http
      .patch(`/api/returns/${ret.id}`)
      .set(auth(buyer))
      .send({ version: 1, notes: 'second' });
    expect(second.status).toBe(409);
    expect(second.body.current).toMatchObject({ id: ret.id, version: 2, notes: 'first' });
    const noVersion = await t.http.patch(`/api/returns/${ret.id}`).set(auth(buyer)).send({});
    expect(noVersion.status).toBe(400);
    expect(noVersion.body.message).toContain('version must be a whole number');
    const staleStep = await step(ret.id, 'cancel', { version: 1, reason: 'no longer needed' });
    expect(staleStep.status).toBe(409);
    expect(staleStep.body.current.status).toBe('draft');
  });

  it('makes one open return of four raised at once for one lot, and one of two steps at once', async () => {
    const { lots } = await supplierWithRejects('Fernhill Electrical Supply');
    const raced = await Promise.all([1, 2, 3, 4].map(() => createReturn([lots[0].id])));
    expect(raced.map((r) => r.status).sort()).toEqual([201, 422, 422, 422]);
    const open = await t.http
      .get(`/api/returns?supplierId=${raced[0].body.supplier?.id ?? lots[0].supplier.id}`)
      .set(auth(buyer));
    expect(open.body.total).toBe(1);
    const id = open.body.items[0].id;
    const both = await Promise.all([
      step(id, 'cancel', { reason: 'first clerk cancels' }),
      step(id, 'ship', { carrier: 'Northline Freight', shippedOn: '2026-11-30', quantity: 5 }),
    ]);
    const codes = both.map((r) => r.status).sort();
    expect(codes[0]).toBe(200);
    expect([409, 422]).toContain(codes[1]); // 409 when both read version 1, 422 when one came after
    const now = await t.http.get(`/api/returns/${id}`).set(auth(buyer));
    expect(now.body.version).toBe(2);
  });

  it('lists returns paged with status and supplier filters, and as CSV', async () => {
    const { supplier, lots } = await supplierWithRejects('Ironside Cable Depot', 2);
    const one = (await createReturn([lots[0].id])).body;
    await createReturn([lots[1].id]);
    await t.http
      .post(`/api/returns/${one.id}/ship`)
      .set(auth(buyer))
      .send({ carrier: 'Northline Freight', shippedOn: '2026-11-30', quantity: 1 });
    const drafts = await t.http
      .get(`/api/returns?supplierId=${supplier.id}&status=draft`)
      .set(auth(buyer));
    expect(drafts.status).toBe(200);
    expect(drafts.body).toMatchObject({ total: 1, page: 1, pageSize: 25 });
    expect(drafts.body.items[0].lots[0].id).toBe(lots[1].id);
    const both = await t.http
      .get(`/api/returns?supplierId=${supplier.id}&status=draft,shipped&pageSize=1`)
      .set(auth(buyer));
    expect(both.body.total).toBe(2);
    expect(both.body.items).toHaveLength(1);
    expect((await t.http.get('/api/returns?status=lost').set(auth(buyer))).status).toBe(400);
    const got = await t.http.get(`/api/returns/${one.id}`).set(auth(buyer));
    expect(got.body).toMatchObject({ id: one.id, status: 'shipped' });
    expect((await t.http.get('/api/returns/99999').set(auth(buyer))).status).toBe(404);
    const csv = await t.http
      .get(`/api/returns/export.csv?supplierId=${supplier.id}`)
      .set(auth(buyer));
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    const rows = parseCsv(csv.text);
    expect(rows[0]).toEqual([
      'RTV',
      'Status',
      'Supplier code',
      'Supplier',
      'Lots',
      'POs',
      'RMA',
      'Chargeback',
      'Currency',
      'Raised by',
      'Raised (UTC)',
    ]);
    expect(rows[1][7]).toMatch(/^\d+\.\d\d$/);
    expect(rows[1][8]).toMatch(/^[A-Z]{3}$/);
    expect(rows.slice(1).map((r) => r[3])).toEqual([
      'Ironside Cable Depot',
      'Ironside Cable Depot',
    ]);
  });
});

describe('GET /api/returns/:id/export.csv', () => {
  it('writes one row per reading for the supplier, and neutralises formula cells', async () => {
    const { lots, ncrs } = await supplierWithRejects('=HYPERLINK("x")');
    const ret = (await createReturn([lots[0].id], { rmaNumber: 'RMA-7781' })).body;
    const res = await t.http.get(`/api/returns/${ret.id}/export.csv`).set(auth(buyer));
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toBe(
      `attachment; filename="${ret.number}-readings.csv"`,
    );
    expect(res.text.startsWith('\ufeff')).toBe(true); // so spreadsheets read "mm²" right
    const rows = parseCsv(res.text);
    // The readings export's own columns (exports/readings-csv.ts): in words, with units.
    expect(rows[0]).toEqual([
      'Reading',
      'Lot',
      'Supplier lot code',
      'PO',
      'Packing slip',
      'RTV',
      'RMA',
      'NCR',
      'Supplier',
      'SKU',
      'Received (UTC)',
      'Unit',
      'Conductor',
      'Label',
      'Method',
      'Mass (g)',
      'Length (mm)',
      'Strands counted',
      'Strand diameters (mm)',
      'Resistance (mΩ)',
      'Temperature (°C)',
      'Overall diameter (mm)',
      'Stranding increment (%)',
      'Instruments',
      'Area (mm²)',
      'U, k=2 (mm²)',
      'Coverage factor k',
      'Of nominal (%)',
      'Measures as',
      'Material found',
      'Verdict',
      'Confirmed unusual',
      'Taken (UTC)',
      'Voided',
      'Void reason',
    ]);
    const plan = lots[0].samplingPlan;
    expect(rows).toHaveLength(1 + plan.sampleSize * 2); // every unit, power and ground
    const row = Object.fromEntries(rows[0].map((h, i) => [h, rows[1][i]]));
    expect(row).toMatchObject({
      Lot: String(lots[0].id),
      PO: lots[0].poNumber,
      RTV: ret.number,
      RMA: 'RMA-7781',
      NCR: ncrs[0],
      Supplier: `'=HYPERLINK("x")`,
      Unit: 'K-1',
      Conductor: 'power',
      Label: '4 AWG',
      Method: 'Mass and length',
      'Length (mm)': '500',
      // 8.4 mm² of copper (the fixture's reading) where 4 AWG is 21.15 (ASTM B258): 39.7 %
      // of nominal; U to two significant figures and the area to the same place (GUM 7.2.6)
      'Area (mm²)': '8.40',
      'U, k=2 (mm²)': '0.24',
      'Of nominal (%)': '39.7',
      'Measures as': '8 AWG',
      'Material found': 'copper',
      Verdict: 'nonconforming',
      Voided: 'no',
    });
    expect(row['Mass (g)']).toMatch(/^\d+(\.\d+)?$/);
    // No float tails anywhere: no number with more than six decimals.
    expect(res.text).not.toMatch(/\d\.\d{7,}/);
    expect(res.text).toContain(`"'=HYPERLINK(""x"")"`);
    expect(res.text).not.toMatch(/,=HYPERLINK|,"=HYPERLINK/);
    // The lot's timeline shows the evidence went out.
    const events = await fx.em().find(AuditEvent, { action: 'return.export', lotId: lots[0].id });
    expect(events.map((e) => [e.entityId, e.actorEmail, e.after])).toEqual([
      [ret.id, DEMO.buyer, { number: ret.number, format: 'CSV' }],
    ]);
  });
});

describe('a return id in the path', () => {
  it('answers 404 for an unknown return and 400 for what cannot be an id, on every driver', async () => {
    for (const path of ['', '/export.csv', '/evidence.pdf']) {
      expect((await t.http.get(`/api/returns/999999${path}`).set(auth(buyer))).status).toBe(404);
      for (const bad of ['99999999999999999999', '0', 'abc']) {
        const res = await t.http.get(`/api/returns/${bad}${path}`).set(auth(buyer));
        expect(res.status, `${bad}${path}`).toBe(400);
        expect(res.body.message).toBe(
          'id must be a record id: a whole number from 1 to 2147483647',
        );
      }
    }
  });
});

describe('GET /api/returns/:id/evidence.pdf', () => {
  const pdfOf = async (id: number, query = '') => {
    const res = await t.http
      .get(`/api/returns/${id}/evidence.pdf${query}`)
      .set(auth(buyer))
      .buffer(true)
      .parse(collect);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    return res.body as Buffer;
  };
  const textOf = (pdf: Buffer) => pdfTool('pdftotext', pdf, ['-layout']).replace(/\s+/g, ' ');

  it('is written for the supplier: one size per reading, inputs in words, U at GUM precision, budgets, metals, photos, plan, decision, chargeback with currency', async () => {
    const { lots, ncrs } = await supplierWithRejects('Meadowlark Wire Goods');
    const image = new Jimp({ width: 64, height: 48, color: 0xb87333ff });
    const storage = t.app.get(StorageService);
    await storage.put('thumbs/evidence-test.png', await image.getBuffer('image/png'));
    const em = fx.em();
    em.create(Photo, {
      lot: lots[0].id,
      caption: 'Cut end of unit 1, power',
      storageKey: 'thumbs/evidence-test.png',
      thumbnailKey: 'thumbs/evidence-test.png',
      mimeType: 'image/png',
      sizeBytes: 100,
      sha256: '0'.repeat(64),
      width: 64,
      height: 48,
      uploadedBy: await em.findOneOrFail(User, { email: DEMO.clerk }),
    });
    await em.flush();
    // The QA lead's own reason: internal until purchasing shares it.
    await em.nativeUpdate(
      Decision,
      { lot: lots[0].id },
      { reason: 'Internal: third short lot this quarter' },
    );
    const ret = (
      await createReturn([lots[0].id], {
        costs: { inspectionHours: 1, hourlyRate: 40 },
        currency: 'EUR',
        supplierNote: 'The power conductor is 8 AWG where the label says 4 AWG.',
      })
    ).body;
    const pdf = await pdfOf(ret.id);
    const text = textOf(pdf);
    const plan = lots[0].samplingPlan;
    for (const want of [
      `Return to vendor ${ret.number}`,
      `Evidence pack for Meadowlark Wire Goods`,
      `${ret.number}-EP`, // the document's own number
      'Issued:',
      'Status: Draft: not yet sent to the supplier',
      'Note to the supplier',
      'The power conductor is 8 AWG where the label says 4 AWG.',
      // The chargeback with its ISO 4217 currency
      '1 h × EUR 40.00 = EUR 40.00',
      'Total chargeback: EUR 40.00',
      `PO: ${lots[0].poNumber}`,
      'AQL 2.5',
      'ANSI/ASQ Z1.4',
      `Reject: ${plan.sampleSize} of ${plan.sampleSize} units tested, 2 nonconforming`,
      `Rejected by`,
      ncrs[0],
      'Every reading, with its expanded uncertainty',
      // One size name per reading: the drawing and the table say the same
      'Label 4 AWG',
      'Measures as 8 AWG',
      // Inputs in words with units, U to two significant figures (GUM 7.2.6)
      'mass 38.08 g, length 500 mm', // the fixture's 8.4 mm² × 8.89 g/cm³ × 0.5 m × 1.02
      '8.40 ± 0.24 mm² (k = 2)',
      '39.7 %',
      // The metal palette's legend
      'Copper-clad aluminium',
      'Metal not identified',
      'Uncertainty budget of each reading',
      'mass: resolution',
      'GUM F.2.2.1',
      'Cut end of unit 1, power',
      "defer to local codes, the equipment maker's instructions and licensed practice",
    ]) {
      expect(text).toContain(want);
    }
    expect(text).not.toContain('massG');
    expect(text).not.toContain('± 0.00 ');
    expect(text).not.toContain('Measured 8.4');
    expect(text).not.toContain('Internal: third short lot');
    const images = pdfTool('pdfimages', pdf, ['-list']);
    expect(
      images.split('\n').filter((l) => /^\s+\d+\s+\d+\s+image/.test(l)).length,
    ).toBeGreaterThanOrEqual(1);
    expect(pdfTool('pdfinfo', pdf)).toMatch(/Page size:\s+595\.\d+ x 841\.\d+ pts \(A4\)/);
    if (process.env.KEEP_PACK) writeFileSync(process.env.KEEP_PACK, pdf);

    // Purchasing shares the QA lead's reason; US Letter on request.
    const shared = await t.http
      .patch(`/api/returns/${ret.id}`)
      .set(auth(buyer))
      .send({ version: ret.version, shareDecisionReason: true });
    expect(shared.status, JSON.stringify(shared.body)).toBe(200);
    const letter = await pdfOf(ret.id, '?paper=letter');
    expect(textOf(letter)).toContain('Reason: Internal: third short lot this quarter');
    expect(pdfTool('pdfinfo', letter)).toMatch(/Page size:\s+612 x 792 pts \(letter\)/);
    if (process.env.KEEP_PACK) writeFileSync(`${process.env.KEEP_PACK}.letter.pdf`, letter);
    const bad = await t.http.get(`/api/returns/${ret.id}/evidence.pdf?paper=a3`).set(auth(buyer));
    expect(bad.status).toBe(400);
    expect(bad.body.errors).toEqual([{ field: 'paper', message: 'paper must be a4 or letter' }]);
  });
});

describe('roles on returns', () => {
  it('lets purchasing and admin in and keeps clerk and qa_lead out', async () => {
    const { lots } = await supplierWithRejects('Foxglove Cable Traders');
    const ret = (await createReturn([lots[0].id])).body;
    const routes: ['get' | 'post' | 'patch', string][] = [
      ['post', '/api/returns'],
      ['get', '/api/returns'],
      ['get', '/api/returns/export.csv'],
      ['get', `/api/returns/${ret.id}`],
      ['patch', `/api/returns/${ret.id}`],
      ['get', `/api/returns/${ret.id}/export.csv`],
      ['get', `/api/returns/${ret.id}/evidence.pdf`],
      ['post', `/api/returns/${ret.id}/email`],
    ];
    for (const email of [DEMO.clerk, DEMO.qa]) {
      const token = await t.token(email);
      for (const [m, path] of routes) {
        const res = await t.http[m](path).set(auth(token)).set('Origin', ORIGIN).send({});
        expect(res.status, `${email} ${m} ${path}`).toBe(403);
      }
    }
    const admin = await t.token(DEMO.admin);
    expect((await t.http.get(`/api/returns/${ret.id}`).set(auth(admin))).status).toBe(200);
  });
});
