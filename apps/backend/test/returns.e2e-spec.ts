import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Papa from 'papaparse';
import type { Response } from 'superagent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Jimp } from 'jimp';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { Photo } from '../src/photos/entities/photo.entity';
import { StorageService } from '../src/storage/storage.service';
import { User } from '../src/users/entities/user.entity';
import { Fixtures, rejectedLot } from './helpers/decision-fixtures';
import { DEMO, ORIGIN, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
let fx: Fixtures;
let buyer: string;
beforeAll(async () => {
  t = await startTestApp();
  fx = new Fixtures(t);
  buyer = await t.token(DEMO.buyer);
});
afterAll(async () => t.close());

const auth = (token: string) => ({ Authorization: `Bearer ${token}` });
function collect(res: Response, cb: (err: Error | null, body: Buffer) => void) {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => cb(null, Buffer.concat(chunks)));
}
function pdfTool(tool: string, pdf: Buffer, args: string[] = []): string {
  const file = join(t.dir, `doc-${Date.now()}-${Math.random()}.pdf`);
  writeFileSync(file, pdf);
  return execFileSync(tool, [...args, file, ...(tool === 'pdftotext' ? ['-'] : [])]).toString();
}
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
  it('moves draft → sent → acknowledged → closed, returns the lots when sent, refuses skips with 422', async () => {
    const { lots } = await supplierWithRejects('Lakeshore Harness Supply');
    const created = (await createReturn([lots[0].id])).body;
    const skip = await t.http
      .patch(`/api/returns/${created.id}`)
      .set(auth(buyer))
      .send({ status: 'acknowledged' });
    expect(skip.status).toBe(422);
    expect(skip.body.message).toMatch(/cannot go from draft to acknowledged/);
    const sent = await t.http
      .patch(`/api/returns/${created.id}`)
      .set(auth(buyer))
      .send({ status: 'sent', costs: { other: 12.5 } });
    expect(sent.status).toBe(200);
    expect(sent.body).toMatchObject({
      status: 'sent',
      chargebackTotal: 12.5,
      lots: [{ id: lots[0].id, status: 'returned' }],
    });
    const back = await t.http
      .patch(`/api/returns/${created.id}`)
      .set(auth(buyer))
      .send({ status: 'draft' });
    expect(back.status).toBe(422);
    for (const status of ['acknowledged', 'closed']) {
      const res = await t.http
        .patch(`/api/returns/${created.id}`)
        .set(auth(buyer))
        .send({ status });
      expect(res.status).toBe(200);
    }
    const closed = await t.http
      .patch(`/api/returns/${created.id}`)
      .set(auth(buyer))
      .send({ notes: 'late note' });
    expect(closed.status).toBe(422);
    const timeline = await t.http.get(`/api/lots/${lots[0].id}/timeline`).set(auth(buyer));
    const actions = timeline.body.map((e: { action: string }) => e.action);
    expect(actions).toEqual(
      expect.arrayContaining([
        'decision.create',
        'ncr.create',
        'return.create',
        'lot.returned',
        'return.update',
      ]),
    );
    const summaries = timeline.body.map((e: { summary: string }) => e.summary).join('\n');
    expect(summaries).toMatch(new RegExp(`updated return ${created.number} from draft to sent`));
  });

  it('lists returns paged with status and supplier filters, and as CSV', async () => {
    const { supplier, lots } = await supplierWithRejects('Ironside Cable Depot', 2);
    const one = (await createReturn([lots[0].id])).body;
    await createReturn([lots[1].id]);
    await t.http.patch(`/api/returns/${one.id}`).set(auth(buyer)).send({ status: 'sent' });
    const drafts = await t.http
      .get(`/api/returns?supplierId=${supplier.id}&status=draft`)
      .set(auth(buyer));
    expect(drafts.status).toBe(200);
    expect(drafts.body).toMatchObject({ total: 1, page: 1, pageSize: 25 });
    expect(drafts.body.items[0].lots[0].id).toBe(lots[1].id);
    const both = await t.http
      .get(`/api/returns?supplierId=${supplier.id}&status=draft,sent&pageSize=1`)
      .set(auth(buyer));
    expect(both.body.total).toBe(2);
    expect(both.body.items).toHaveLength(1);
    expect((await t.http.get('/api/returns?status=lost').set(auth(buyer))).status).toBe(400);
    const got = await t.http.get(`/api/returns/${one.id}`).set(auth(buyer));
    expect(got.body).toMatchObject({ id: one.id, status: 'sent' });
    expect((await t.http.get('/api/returns/99999').set(auth(buyer))).status).toBe(404);
    const csv = await t.http
      .get(`/api/returns/export.csv?supplierId=${supplier.id}`)
      .set(auth(buyer));
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    const rows = parseCsv(csv.text);
    expect(rows[0]).toEqual([
      'number',
      'status',
      'supplierCode',
      'supplierName',
      'lotIds',
      'poNumbers',
      'rmaNumber',
      'chargebackTotal',
      'createdBy',
      'createdAt',
    ]);
    expect(rows.slice(1).map((r) => r[3])).toEqual([
      'Ironside Cable Depot',
      'Ironside Cable Depot',
    ]);
  });
});

describe('GET /api/returns/:id/export.csv', () => {
  it('writes one row per reading and neutralises formula cells', async () => {
    const { lots } = await supplierWithRejects('=HYPERLINK("x")');
    const ret = (await createReturn([lots[0].id])).body;
    const res = await t.http.get(`/api/returns/${ret.id}/export.csv`).set(auth(buyer));
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toBe(
      `attachment; filename="${ret.number}-readings.csv"`,
    );
    const rows = parseCsv(res.text);
    // The readings export's own columns (exports/readings-csv.ts).
    expect(rows[0]).toEqual([
      'readingId',
      'lotId',
      'poNumber',
      'supplier',
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
    ]);
    const plan = lots[0].samplingPlan;
    expect(rows).toHaveLength(1 + plan.sampleSize * 2); // every unit, power and ground
    const first = rows[1];
    expect(first.slice(1, 5)).toEqual([
      String(lots[0].id),
      lots[0].poNumber,
      `'=HYPERLINK("x")`,
      expect.any(String),
    ]);
    expect(first.slice(6, 11)).toEqual([
      'K-1',
      'power',
      '4 AWG',
      'mass',
      expect.stringMatching(/^massG=[\d.]+; lengthMm=500$/),
    ]);
    expect(first.slice(11, 19)).toEqual([
      '8.4',
      '0.24',
      '0.397',
      '8 AWG',
      'copper',
      'nonconforming',
      expect.any(String),
      'false',
    ]);
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
  it('holds the plan, counts, readings with uncertainty, drawings, photos, decision, chargeback and caution', async () => {
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
    const ret = (
      await createReturn([lots[0].id], { costs: { inspectionHours: 1, hourlyRate: 40 } })
    ).body;
    const res = await t.http
      .get(`/api/returns/${ret.id}/evidence.pdf`)
      .set(auth(buyer))
      .buffer(true)
      .parse(collect);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const text = pdfTool('pdftotext', res.body as Buffer, ['-layout']).replace(/\s+/g, ' ');
    for (const want of [
      `Return to vendor ${ret.number}`,
      'Meadowlark Wire Goods',
      'AQL 2.5',
      `Reject: ${lots[0].samplingPlan.sampleSize} of ${lots[0].samplingPlan.sampleSize} units tested, 2 nonconforming`,
      `rejected by`,
      ncrs[0],
      'Every reading, with its expanded uncertainty',
      '± 0.24',
      '8 AWG',
      'Label 4 AWG',
      'Total chargeback: 40.00',
      'Cut end of unit 1, power',
      "defer to local codes, the equipment maker's instructions and licensed practice",
    ]) {
      expect(text).toContain(want);
    }
    const images = pdfTool('pdfimages', res.body as Buffer, ['-list']);
    expect(
      images.split('\n').filter((l) => /^\s+\d+\s+\d+\s+image/.test(l)).length,
    ).toBeGreaterThanOrEqual(1);
    if (process.env.KEEP_PACK) writeFileSync(process.env.KEEP_PACK, res.body as Buffer);
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
