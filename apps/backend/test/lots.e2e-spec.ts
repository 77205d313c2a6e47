import { MikroORM } from '@mikro-orm/core';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { Lot } from '../src/lots/entities/lot.entity';
import { neutralise as guardCell } from '../src/common/csv';
import { InspectionState } from '../src/products/entities/inspection-state.entity';
import { call, dayFromToday } from './helpers/api';
import { createBench, GOOD_4AWG_MASS } from './helpers/fixtures';
import { makeProduct, makeSupplier, spoolBody } from './helpers/catalog';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
let good: { id: number; name: string; version: number };
let suspended: { id: number; name: string };
let spoolId: number;
let levelTwoId: number;
let suspendedProductId: number;

beforeAll(async () => {
  t = await startTestApp();
  good = await makeSupplier(t, 'LOT-GOOD', { name: 'Lotfixture Copper Mills' });
  suspended = await makeSupplier(t, 'LOT-SUSP', { name: '=HYPERLINK("x")', status: 'suspended' });
  spoolId = (await makeProduct(t, spoolBody(good.id, 'LS-4'))).id;
  levelTwoId = (await makeProduct(t, spoolBody(good.id, 'LS-II', { inspectionLevel: 'II' }))).id;
  suspendedProductId = (await makeProduct(t, spoolBody(suspended.id, 'LS-SUS'))).id;
});
afterAll(async () => t.close());

// Each delivery its own PO: one PO and packing slip received twice is asked about (409).
let poCounter = 1000;
const lotBody = (productId: number, extra: object = {}) => ({
  productId,
  poNumber: `PO-${(poCounter += 1)}`,
  packingSlip: 'PS-77',
  supplierLotCode: 'SLC-A',
  quantity: 40,
  unit: 'spools',
  ...extra,
});

describe('POST /api/lots', () => {
  it('receives a lot on hold with its plan stored, received by the clerk, audited', async () => {
    const res = await call(
      t,
      DEMO.clerk,
      'post',
      '/api/lots',
      lotBody(levelTwoId, { quantity: 800 }),
    );
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      status: 'on_hold',
      poNumber: 'PO-1001',
      packingSlip: 'PS-77',
      supplierLotCode: 'SLC-A',
      quantity: 800,
      unit: 'spools',
      receivedBy: { name: 'Rosa Okafor' },
      product: { id: levelTwoId, sku: 'LS-II', kind: 'spool' },
      supplier: { id: good.id, code: 'LOT-GOOD', status: 'approved' },
      // MIL-STD-105E / ANSI/ASQ Z1.4: 501–1200 at level II → J, n=80; AQL 1.0 Ac 2, Re 3.
      samplingPlan: {
        severity: 'normal',
        level: 'II',
        aql: '1.0',
        codeLetter: 'J',
        sampleSize: 80,
        accept: 2,
        reject: 3,
        inspectAll: false,
      },
      supplierWarning: null,
      version: 1,
    });
    const em = t.app.get(MikroORM).em.fork();
    const lot = await em.findOneOrFail(Lot, { id: res.body.id });
    expect(lot.samplingPlan).toEqual(res.body.samplingPlan);
    const events = await em.find(AuditEvent, { action: 'lot.create', lotId: res.body.id });
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({
      entityType: 'lot',
      entityId: res.body.id,
      actorEmail: DEMO.clerk,
    });
  });

  it('uses the S-3 default: a lot of 600 cuts 13 (code letter E, Ac 0, Re 1)', async () => {
    const res = await call(t, DEMO.qa, 'post', '/api/lots', lotBody(spoolId, { quantity: 600 }));
    expect(res.body.samplingPlan).toMatchObject({
      level: 'S-3',
      codeLetter: 'E',
      sampleSize: 13,
      accept: 0,
      reject: 1,
    });
  });

  it('lets QA lead and admin receive; refuses purchasing and anonymous', async () => {
    expect((await call(t, DEMO.admin, 'post', '/api/lots', lotBody(spoolId))).status).toBe(201);
    expect((await call(t, DEMO.buyer, 'post', '/api/lots', lotBody(spoolId))).status).toBe(403);
    expect((await t.http.post('/api/lots').send(lotBody(spoolId))).status).toBe(401);
  });

  it('names the bad fields; a quantity below 1 has its own sentence', async () => {
    const res = await call(t, DEMO.clerk, 'post', '/api/lots', {
      productId: 'abc',
      poNumber: '',
      quantity: 0,
      unit: '',
      colour: 'red',
    });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual(
      expect.arrayContaining([
        'property colour should not exist',
        'productId must be the id of a product',
        'poNumber is required',
        'quantity must be a whole number of at least 1',
        'unit is required',
      ]),
    );
    for (const quantity of [2.5, '40', -3]) {
      const bad = await call(t, DEMO.clerk, 'post', '/api/lots', lotBody(spoolId, { quantity }));
      expect(bad.body.message).toEqual(['quantity must be a whole number of at least 1']);
    }
    const unknown = await call(t, DEMO.clerk, 'post', '/api/lots', lotBody(99999));
    expect(unknown.status).toBe(400);
    expect(unknown.body.message).toEqual(['productId must be the id of a product']);
  });

  it('asks before receiving a PO and packing slip already received; another slip on the PO is a delivery like any', async () => {
    const first = await call(
      t,
      DEMO.clerk,
      'post',
      '/api/lots',
      lotBody(spoolId, { poNumber: 'PO-TWICE-9', packingSlip: 'PS-TWICE-1' }),
    );
    expect(first.status).toBe(201);
    const id = first.body.id as number;

    // The form's look-up while the clerk types: case and outer spaces do not hide it.
    const before = await call(
      t,
      DEMO.clerk,
      'get',
      '/api/lots/received-before?poNumber=po-twice-9&packingSlip=%20ps-twice-1%20',
    );
    expect(before.status).toBe(200);
    expect(before.body.lots.map((l: { id: number }) => l.id)).toEqual([id]);
    expect(before.body.lots[0]).toMatchObject({
      poNumber: 'PO-TWICE-9',
      packingSlip: 'PS-TWICE-1',
    });
    const none = await call(
      t,
      DEMO.clerk,
      'get',
      '/api/lots/received-before?poNumber=PO-TWICE-9&packingSlip=PS-TWICE-2',
    );
    expect(none.body.lots).toEqual([]);
    const missing = await call(t, DEMO.clerk, 'get', '/api/lots/received-before?poNumber=PO-1');
    expect(missing.status).toBe(400);
    expect(missing.body.message).toEqual(expect.arrayContaining(['packingSlip is required']));

    // Saving the same slip again: 409 on the packing slip, naming the lot, nothing saved.
    const count = async () =>
      await t.app.get(MikroORM).em.fork().count(Lot, { poNumber: 'PO-TWICE-9' });
    const again = await call(
      t,
      DEMO.clerk,
      'post',
      '/api/lots',
      lotBody(spoolId, { poNumber: ' PO-TWICE-9 ', packingSlip: 'ps-twice-1', quantity: 12 }),
    );
    expect(again.status).toBe(409);
    expect(again.body.errors).toEqual([
      {
        field: 'packingSlip',
        message: expect.stringMatching(
          new RegExp(
            `^PO PO-TWICE-9 with packing slip ps-twice-1 was already received as lot ${id} \\(received \\d{4}-\\d{2}-\\d{2}, 40 spools of LOT-GOOD LS-4\\)\\. If this is another delivery under the same slip, confirm to receive it again`,
          ),
        ),
      },
    ]);
    expect(again.body.alreadyReceived).toEqual([
      expect.objectContaining({ id, status: 'on_hold', quantity: 40, unit: 'spools' }),
    ]);
    expect(await count()).toBe(1);

    // Another slip on the same PO (a second delivery) needs no confirmation.
    const second = await call(
      t,
      DEMO.clerk,
      'post',
      '/api/lots',
      lotBody(spoolId, { poNumber: 'PO-TWICE-9', packingSlip: 'PS-TWICE-2' }),
    );
    expect(second.status).toBe(201);
    // Nor does a delivery without a slip.
    const noSlip = await call(
      t,
      DEMO.clerk,
      'post',
      '/api/lots',
      lotBody(spoolId, { poNumber: 'PO-TWICE-9', packingSlip: null }),
    );
    expect(noSlip.status).toBe(201);

    // Confirmed: received again, the audit naming the lot it repeats.
    const confirmed = await call(
      t,
      DEMO.clerk,
      'post',
      '/api/lots',
      lotBody(spoolId, { poNumber: 'PO-TWICE-9', packingSlip: 'PS-TWICE-1', receiveAgain: true }),
    );
    expect(confirmed.status).toBe(201);
    expect(await count()).toBe(4);
    const audit = await t.app
      .get(MikroORM)
      .em.fork()
      .findOneOrFail(AuditEvent, { action: 'lot.create', entityId: confirmed.body.id });
    expect(audit.after).toMatchObject({ receivedAgainOf: [id] });
    // The look-up now names both receipts of the slip, oldest first.
    const both = await call(
      t,
      DEMO.clerk,
      'get',
      '/api/lots/received-before?poNumber=PO-TWICE-9&packingSlip=PS-TWICE-1',
    );
    expect(both.body.lots.map((l: { id: number }) => l.id)).toEqual([id, confirmed.body.id]);
    const bad = await call(
      t,
      DEMO.clerk,
      'post',
      '/api/lots',
      lotBody(spoolId, { receiveAgain: 'yes' }),
    );
    expect(bad.body.message).toEqual(['receiveAgain must be true or false']);
  });

  it('receives a lot of one (a single drum): one sample, every unit, the rule cited', async () => {
    const res = await call(
      t,
      DEMO.clerk,
      'post',
      '/api/lots',
      lotBody(spoolId, { quantity: 1, poNumber: 'PO-SINGLE-1' }),
    );
    expect(res.status).toBe(201);
    expect(res.body.samplingPlan).toMatchObject({
      sampleSize: 1,
      inspectAll: true,
      accept: 0,
      reject: 1,
    });
    const plan = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/products/${spoolId}/sampling-plan?quantity=1`,
    );
    expect(plan.status).toBe(200);
    expect(plan.body.samplingPlan).toMatchObject({ sampleSize: 1, inspectAll: true });
    expect(plan.body.message).toMatch(/inspect the one unit of the lot/);
    expect(plan.body.message).toContain(
      'ANSI/ASQ Z1.4 / ISO 2859-1: when the sample size equals or exceeds the lot size, inspect every unit (100 % inspection).',
    );
  });

  it('receives a suspended supplier’s delivery, with a warning', async () => {
    const res = await call(
      t,
      DEMO.clerk,
      'post',
      '/api/lots',
      lotBody(suspendedProductId, { poNumber: 'PO-SUS-1' }),
    );
    expect(res.status).toBe(201);
    expect(res.body.status).toBe('on_hold');
    expect(res.body.supplierWarning).toMatch(/is suspended: this delivery is received and held/);
  });

  it('refuses a discontinued stream (ISO 2859-1) and an inactive product with 422, saving nothing', async () => {
    const p = await makeProduct(t, spoolBody(good.id, 'LS-STOP'));
    const em = t.app.get(MikroORM).em.fork();
    const state = await em.findOneOrFail(InspectionState, { product: p.id });
    state.severity = 'discontinued';
    state.reason = '5 lots not accepted on tightened inspection: inspection is discontinued.';
    await em.flush();
    const res = await call(t, DEMO.clerk, 'post', '/api/lots', lotBody(p.id));
    expect(res.status).toBe(422);
    expect(res.body.message).toMatch(
      /^Inspection of Lotfixture Copper Mills LS-STOP is discontinued \(ISO 2859-1\)/,
    );
    expect(res.body.message).toMatch(/until the QA lead restores inspection/);
    const off = await makeProduct(t, spoolBody(good.id, 'LS-OFF'));
    await call(t, DEMO.qa, 'patch', `/api/products/${off.id}`, {
      version: off.version,
      active: false,
    });
    const inactive = await call(t, DEMO.clerk, 'post', '/api/lots', lotBody(off.id));
    expect(inactive.status).toBe(422);
    expect(inactive.body.message).toMatch(/no longer an active product/);
    expect(await em.fork().count(Lot, { product: { $in: [p.id, off.id] } })).toBe(0);
  });
});

describe('GET /api/lots', () => {
  beforeAll(async () => {
    for (const [po, quantity] of [
      ['PO-LIST-3', 300],
      ['PO-LIST-1', 100],
      ['PO-LIST-2', 200],
    ] as const) {
      await call(
        t,
        DEMO.clerk,
        'post',
        '/api/lots',
        lotBody(spoolId, { poNumber: po, quantity, supplierLotCode: `SLC-${po}` }),
      );
    }
  });

  it('lets every role read, newest first by default', async () => {
    for (const who of [DEMO.clerk, DEMO.qa, DEMO.buyer, DEMO.admin]) {
      expect((await call(t, who, 'get', '/api/lots')).status).toBe(200);
    }
    const res = await call(t, DEMO.buyer, 'get', '/api/lots?pageSize=100');
    expect(res.body.total).toBe(res.body.items.length);
    const ids = res.body.items.map((l: { id: number }) => l.id);
    expect(ids).toEqual([...ids].sort((a, b) => b - a));
    expect(res.body.items[0]).toMatchObject({
      poNumber: 'PO-LIST-2',
      receivedBy: { name: 'Rosa Okafor' },
    });
    // Instants read as plain rows come back as numbers on SQLite and text on PostgreSQL.
    for (const l of res.body.items) expect(l.receivedAt).toMatch(/^\d{4}-\d\d-\d\dT/);
  });

  it('filters by status, supplier, product, dates and text across PO, lot code, SKU and supplier', async () => {
    const em = t.app.get(MikroORM).em.fork();
    const inspecting = await em.findOneOrFail(Lot, { poNumber: 'PO-LIST-1' });
    inspecting.status = 'inspecting';
    inspecting.receivedAt = new Date('2026-01-15T10:00:00Z');
    await em.flush();
    const byStatus = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/lots?status=inspecting,awaiting_decision&productId=${spoolId}`,
    );
    expect(byStatus.body.items.map((l: { poNumber: string }) => l.poNumber)).toEqual(['PO-LIST-1']);
    const bySupplier = await call(t, DEMO.clerk, 'get', `/api/lots?supplierId=${suspended.id}`);
    expect(bySupplier.body.items.map((l: { poNumber: string }) => l.poNumber)).toEqual([
      'PO-SUS-1',
    ]);
    const byProduct = await call(t, DEMO.clerk, 'get', `/api/lots?productId=${levelTwoId}`);
    expect(byProduct.body.total).toBe(1);
    const byDay = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/lots?receivedFrom=2026-01-15&receivedTo=2026-01-15&productId=${spoolId}`,
    );
    expect(byDay.body.items.map((l: { poNumber: string }) => l.poNumber)).toEqual(['PO-LIST-1']);
    const recent = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/lots?receivedFrom=${dayFromToday(-1)}&pageSize=100`,
    );
    expect(recent.body.items.map((l: { poNumber: string }) => l.poNumber)).not.toContain(
      'PO-LIST-1',
    );
    const q = (text: string) =>
      call(t, DEMO.clerk, 'get', `/api/lots?q=${encodeURIComponent(text)}&pageSize=100`);
    expect((await q('po-list-3')).body.items.map((l: { poNumber: string }) => l.poNumber)).toEqual([
      'PO-LIST-3',
    ]);
    expect((await q('slc-po-list-2')).body.total).toBe(1);
    expect((await q('ps-77')).body.total).toBeGreaterThan(3);
    expect(
      (await q('ls-ii')).body.items.map((l: { product: { sku: string } }) => l.product.sku),
    ).toEqual(['LS-II']);
    expect((await q('hyperlink')).body.items.map((l: { poNumber: string }) => l.poNumber)).toEqual([
      'PO-SUS-1',
    ]);
    const bad = await call(
      t,
      DEMO.clerk,
      'get',
      '/api/lots?status=lost&receivedFrom=2026-02-30&supplierId=x',
    );
    expect(bad.status).toBe(400);
    expect(bad.body.message).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/^status must be a comma list of on_hold/),
        'receivedFrom must be a date written YYYY-MM-DD',
        'supplierId must be the id of a supplier',
      ]),
    );
    const backwards = await call(
      t,
      DEMO.clerk,
      'get',
      '/api/lots?receivedFrom=2026-02-02&receivedTo=2026-02-01',
    );
    expect(backwards.body.message).toEqual(['receivedTo must not be before receivedFrom']);
  });

  it('sorts by quantity, PO and supplier, and pages', async () => {
    const all = await call(t, DEMO.clerk, 'get', '/api/lots?sort=quantity:asc&pageSize=100');
    const quantities = all.body.items.map((l: { quantity: number }) => l.quantity);
    expect(quantities).toEqual([...quantities].sort((a, b) => a - b));
    const po = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/lots?productId=${spoolId}&sort=poNumber:asc&q=po-list`,
    );
    expect(po.body.items.map((l: { poNumber: string }) => l.poNumber)).toEqual([
      'PO-LIST-1',
      'PO-LIST-2',
      'PO-LIST-3',
    ]);
    const bySupplier = await call(t, DEMO.clerk, 'get', '/api/lots?sort=supplier:asc&pageSize=100');
    expect(bySupplier.body.items[0].supplier.name).toBe('=HYPERLINK("x")');
    const page = await call(t, DEMO.clerk, 'get', '/api/lots?sort=quantity:asc&pageSize=2&page=2');
    expect(page.body).toMatchObject({ page: 2, pageSize: 2, total: all.body.total });
    expect(page.body.items.map((l: { id: number }) => l.id)).toEqual(
      all.body.items.slice(2, 4).map((l: { id: number }) => l.id),
    );
    const bad = await call(t, DEMO.clerk, 'get', '/api/lots?sort=colour:asc');
    expect(bad.body.message).toEqual([
      'sort field must be one of receivedAt, poNumber, status, supplier, quantity',
    ]);
  });
});

describe('GET /api/lots/export.csv', () => {
  it('exports the filtered list with formula-looking cells made inert, audited', async () => {
    const res = await call(t, DEMO.buyer, 'get', `/api/lots/export.csv?supplierId=${suspended.id}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="lots.csv"/);
    const parsed = Papa.parse<Record<string, string>>(res.text, {
      header: true,
      skipEmptyLines: true,
    });
    expect(parsed.data).toHaveLength(1);
    expect(parsed.data[0]).toMatchObject({
      poNumber: 'PO-SUS-1',
      supplierName: `'=HYPERLINK("x")`,
      supplierStatus: 'suspended',
      sku: 'LS-SUS',
      quantity: '40',
      sampleSize: '13',
      receivedBy: 'Rosa Okafor',
    });
    expect(parsed.data[0].receivedAt).toMatch(/^\d{4}-\d\d-\d\dT/);
    expect(res.text).not.toMatch(/(^|,)=HYPERLINK/m);
    const em = t.app.get(MikroORM).em.fork();
    const [event] = await em.find(AuditEvent, { action: 'lot.export' });
    expect(event).toMatchObject({
      actorEmail: DEMO.buyer,
      after: { rows: 1, filters: { supplierId: suspended.id } },
    });
    const text = await call(
      t,
      DEMO.clerk,
      'get',
      '/api/lots/export.csv?q=po-list&sort=poNumber:desc',
    );
    const rows = Papa.parse<Record<string, string>>(text.text, {
      header: true,
      skipEmptyLines: true,
    }).data;
    expect(rows.map((r) => r.poNumber)).toEqual(['PO-LIST-3', 'PO-LIST-2', 'PO-LIST-1']);
    expect((await call(t, DEMO.clerk, 'get', '/api/lots/export.csv?status=gone')).status).toBe(400);
  });

  it('refuses a bad sort with 400 before streaming, and audits no export', async () => {
    const em = t.app.get(MikroORM).em.fork();
    const before = await em.count(AuditEvent, { action: 'lot.export' });
    for (const sort of ['bogus', 'poNumber:sideways']) {
      const res = await call(t, DEMO.clerk, 'get', `/api/lots/export.csv?sort=${sort}`);
      expect(res.status, sort).toBe(400);
      expect(res.headers['content-type']).toMatch(/json/);
    }
    expect(await em.count(AuditEvent, { action: 'lot.export' })).toBe(before);
  });

  it('guards every cell that starts with = + - @ tab or CR', () => {
    expect(['=1+1', '+1', '-2', '@SUM(A1)', '\tx', '\rx'].map(guardCell)).toEqual([
      "'=1+1",
      "'+1",
      "'-2",
      "'@SUM(A1)",
      "'\tx",
      "'\rx",
    ]);
    expect([' =x', 'PO-1', 12, null].map(guardCell)).toEqual([' =x', 'PO-1', 12, '']);
  });
});

// Last in the file: it adds a lot and renames a supplier the tests above count on.
describe('the cached lot list', () => {
  it('shows every write at once: a new lot, a supplier renamed, a reading entered', async () => {
    const path = `/api/lots?supplierId=${good.id}&pageSize=100`;
    const list = async () => (await call(t, DEMO.qa, 'get', path)).body;
    const before = await list(); // read and cached
    expect(await list()).toEqual(before); // answered from the cache

    const product = await makeProduct(t, spoolBody(good.id, 'LS-CACHE'));
    const created = await call(t, DEMO.clerk, 'post', '/api/lots', {
      ...lotBody(product.id),
      poNumber: 'PO-CACHE-1',
    });
    expect(created.status).toBe(201);
    const after = await list();
    expect(after.total).toBe(before.total + 1);
    expect(after.items[0]).toMatchObject({ id: created.body.id, status: 'on_hold' });

    const renamed = await call(t, DEMO.buyer, 'patch', `/api/suppliers/${good.id}`, {
      version: good.version,
      name: 'Lotfixture Copper Works',
    });
    expect(renamed.status).toBe(200);
    expect((await list()).items[0].supplier.name).toBe('Lotfixture Copper Works');

    // A reading is written with plain SQL (inspection/reading-writer.ts), not a flush.
    const sample = await call(t, DEMO.clerk, 'post', `/api/lots/${created.body.id}/samples`, {
      conductorId: product.conductors[0].id,
    });
    expect(sample.status).toBe(201);
    const bench = await createBench(t);
    const reading = await call(t, DEMO.clerk, 'post', `/api/samples/${sample.body.id}/readings`, {
      ...GOOD_4AWG_MASS,
      instrumentIds: [bench.balance.id, bench.rule.id],
    });
    expect(reading.status, JSON.stringify(reading.body)).toBe(201);
    const inspected = (await list()).items[0];
    expect(inspected).toMatchObject({ id: created.body.id, status: 'inspecting' });
    expect(inspected.version).toBeGreaterThan(after.items[0].version);
  });

  it('answers a cached page with its ETag, and 304 when the client already has it', async () => {
    const token = await t.token(DEMO.clerk);
    const first = await t.http.get('/api/lots').set('Authorization', `Bearer ${token}`);
    expect(first.status).toBe(200);
    expect(first.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(first.headers.etag).toMatch(/^W\/"/);
    const again = await t.http
      .get('/api/lots')
      .set('Authorization', `Bearer ${token}`)
      .set('If-None-Match', first.headers.etag);
    expect(again.status).toBe(304);
  });
});
