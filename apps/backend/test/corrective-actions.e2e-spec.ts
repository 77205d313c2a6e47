import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CorrectiveAction } from '../src/corrective-actions/entities/corrective-action.entity';
import { auth, dayFromToday } from './helpers/api';
import { Fixtures, rejectedLot, startWithFixtures } from './helpers/decision-fixtures';
import { DEMO, ORIGIN, type TestApp } from './helpers/test-app';

let t: TestApp;
let fx: Fixtures;
let buyer: string;
beforeAll(async () => ({ t, fx, token: buyer } = await startWithFixtures(DEMO.buyer)));
afterAll(async () => t.close());

const inDays = dayFromToday;
const PROBLEM = 'Power conductor of 4 AWG kits measures as 8 AWG on two units';

async function supplierWithLot(name: string) {
  const supplier = await fx.supplier(name, 'quality@example.test');
  const product = await fx.product(supplier.id);
  const { lot } = await rejectedLot(t, fx, product.id);
  return { supplier, lot };
}

async function create(body: Record<string, unknown>, token = buyer) {
  return t.http.post('/api/corrective-actions').set(auth(token)).send(body);
}

/** A change made on the copy as it is now (its current version), unless one is given. */
async function patch(id: number, body: Record<string, unknown>, token = buyer) {
  const version =
    body.version ??
    (await t.http.get(`/api/corrective-actions/${id}`).set(auth(token))).body.version;
  return t.http
    .patch(`/api/corrective-actions/${id}`)
    .set(auth(token))
    .send({ version, ...body });
}

describe('POST /api/corrective-actions', () => {
  it('opens a numbered request against the supplier with its lots, audited on the lot timeline', async () => {
    const { supplier, lot } = await supplierWithLot('Granite Point Cable');
    const res = await create({
      supplierId: supplier.id,
      lotIds: [lot.id],
      problem: PROBLEM,
      dueOn: inDays(14),
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      status: 'open',
      supplier: { id: supplier.id },
      lots: [{ id: lot.id }],
      problem: PROBLEM,
      dueOn: inDays(14),
      overdue: false,
      respondedAt: null,
    });
    const year = new Date().getUTCFullYear();
    expect(res.body.number).toMatch(new RegExp(`^SCAR-${year}-\\d{4}$`));
    const next = await create({
      supplierId: supplier.id,
      lotIds: [],
      problem: PROBLEM,
      dueOn: inDays(7),
    });
    expect(Number(next.body.number.slice(-4))).toBe(Number(res.body.number.slice(-4)) + 1);
    const timeline = await t.http.get(`/api/lots/${lot.id}/timeline`).set(auth(buyer));
    expect(timeline.body.at(-1).summary).toMatch(
      new RegExp(`requested corrective action ${res.body.number}`),
    );
  });

  it('refuses bad dates, short problems, unknown suppliers and lots of another supplier', async () => {
    const a = await supplierWithLot('Willow Creek Wire');
    const b = await supplierWithLot('Basalt Ridge Cable');
    const bad = await create({
      supplierId: a.supplier.id,
      lotIds: [],
      problem: 'short',
      dueOn: '2026-02-30',
    });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toContain('problem must be at least 10 characters');
    const impossible = await create({
      supplierId: a.supplier.id,
      lotIds: [],
      problem: PROBLEM,
      dueOn: '2026-02-30',
    });
    expect(impossible.body.message).toEqual(['dueOn must be a real date YYYY-MM-DD']);
    const past = await create({
      supplierId: a.supplier.id,
      lotIds: [],
      problem: PROBLEM,
      dueOn: inDays(-1),
    });
    expect(past.body.message).toEqual(['dueOn must be today or later']);
    const other = await create({
      supplierId: a.supplier.id,
      lotIds: [b.lot.id],
      problem: PROBLEM,
      dueOn: inDays(3),
    });
    expect(other.status).toBe(422);
    expect(other.body.message).toMatch(/came from another supplier than Willow Creek Wire/);
    expect(
      (await create({ supplierId: 99999, lotIds: [], problem: PROBLEM, dueOn: inDays(3) })).status,
    ).toBe(422);
  });
});

describe('PATCH /api/corrective-actions/:id', () => {
  it('runs open → responded → reopened → responded → verified → closed, refusing other moves with 422', async () => {
    const { supplier, lot } = await supplierWithLot('Copperfield Harness Co');
    const car = (
      await create({
        supplierId: supplier.id,
        lotIds: [lot.id],
        problem: PROBLEM,
        dueOn: inDays(10),
      })
    ).body;
    const skip = await patch(car.id, { status: 'verified' });
    expect(skip.status).toBe(422);
    expect(skip.body.message).toMatch(/is open: it can go to responded, not to verified/);
    const empty = await patch(car.id, {
      status: 'responded',
      containment: 'Quarantined stock at the mill',
    });
    expect(empty.status).toBe(422);
    expect(empty.body.message).toMatch(/rootCause, correctiveAction before marking/);
    const responded = await patch(car.id, {
      status: 'responded',
      containment: 'Quarantined stock at the mill',
      rootCause: 'Wrong drawing die fitted after maintenance',
      correctiveAction: 'Die check added to the shift start sheet',
    });
    expect(responded.status).toBe(200);
    expect(responded.body).toMatchObject({ status: 'responded', respondedAt: expect.any(String) });
    expect((await patch(car.id, { status: 'reopened' }, await t.token(DEMO.qa))).status).toBe(422);
    const reopened = await patch(
      car.id,
      { status: 'reopened', comment: 'Show the die check sheet of the last month' },
      await t.token(DEMO.qa),
    );
    expect(reopened.body).toMatchObject({
      status: 'reopened',
      reopenComment: 'Show the die check sheet of the last month',
    });
    expect((await patch(car.id, { status: 'closed' })).status).toBe(422);
    expect((await patch(car.id, { status: 'responded' })).body.status).toBe('responded');
    const verified = await patch(
      car.id,
      { status: 'verified', verificationNote: 'Die check sheets seen for four weeks' },
      await t.token(DEMO.qa),
    );
    expect(verified.body).toMatchObject({
      status: 'verified',
      verification: {
        note: 'Die check sheets seen for four weeks',
        by: { name: expect.any(String) },
      },
    });
    const closed = await patch(car.id, { status: 'closed' });
    expect(closed.body).toMatchObject({ status: 'closed', closedAt: expect.any(String) });
    expect((await patch(car.id, { problem: 'A later change of mind' })).status).toBe(422);
    const audit = await t.http
      .get(`/api/audit?entityType=corrective_action&action=corrective_action.update&pageSize=100`)
      .set(auth(await t.token(DEMO.admin)));
    const mine = audit.body.items.filter((e: { entityId: number }) => e.entityId === car.id);
    expect(mine.map((e: { after: { status: string } }) => e.after.status)).toEqual([
      'closed',
      'verified',
      'responded',
      'reopened',
      'responded',
    ]);
    expect(
      (await t.http.get(`/api/corrective-actions/${car.id}`).set(auth(buyer))).body.status,
    ).toBe('closed');
    expect((await t.http.get('/api/corrective-actions/99999').set(auth(buyer))).status).toBe(404);
  });
});

describe('GET /api/corrective-actions', () => {
  it('filters by status, supplier and overdue, pages, and exports CSV with the same filters', async () => {
    const { supplier } = await supplierWithLot('=HYPERLINK("x")');
    const late = (
      await create({ supplierId: supplier.id, lotIds: [], problem: PROBLEM, dueOn: inDays(0) })
    ).body;
    const onTime = (
      await create({ supplierId: supplier.id, lotIds: [], problem: PROBLEM, dueOn: inDays(30) })
    ).body;
    const em = fx.em();
    const row = await em.findOneOrFail(CorrectiveAction, late.id);
    row.dueOn = inDays(-3);
    await em.flush();

    const overdue = await t.http
      .get(`/api/corrective-actions?supplierId=${supplier.id}&overdue=true`)
      .set(auth(buyer));
    expect(overdue.status).toBe(200);
    expect(overdue.body.items.map((c: { id: number }) => c.id)).toEqual([late.id]);
    expect(overdue.body.items[0]).toMatchObject({ overdue: true, daysOverdue: 3 });
    const open = await t.http
      .get(`/api/corrective-actions?supplierId=${supplier.id}&status=open&pageSize=1`)
      .set(auth(buyer));
    expect(open.body).toMatchObject({ total: 2, pageSize: 1 });
    expect(open.body.items).toHaveLength(1);
    const byDue = await t.http
      .get(`/api/corrective-actions?supplierId=${supplier.id}&sort=dueOn:asc`)
      .set(auth(buyer));
    expect(byDue.body.items.map((c: { id: number }) => c.id)).toEqual([late.id, onTime.id]);
    expect(
      (await t.http.get('/api/corrective-actions?overdue=maybe').set(auth(buyer))).status,
    ).toBe(400);

    const csv = await t.http
      .get(`/api/corrective-actions/export.csv?supplierId=${supplier.id}&overdue=true`)
      .set(auth(buyer));
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    const rows = Papa.parse<string[]>(csv.text.replace(/^\ufeff/, '').trim(), {
      newline: '\r\n',
    }).data;
    expect(rows).toHaveLength(2);
    expect(rows[1].slice(0, 4)).toEqual([
      late.number,
      'open',
      expect.any(String),
      `'=HYPERLINK("x")`,
    ]);
    expect(rows[1][7]).toBe('yes');
  });
});

describe('roles on corrective actions', () => {
  it('lets purchasing, qa_lead and admin in and keeps the clerk out', async () => {
    const clerk = await t.token(DEMO.clerk);
    for (const [m, path] of [
      ['post', '/api/corrective-actions'],
      ['get', '/api/corrective-actions'],
      ['get', '/api/corrective-actions/export.csv'],
      ['get', '/api/corrective-actions/1'],
      ['patch', '/api/corrective-actions/1'],
    ] as ['get' | 'post' | 'patch', string][]) {
      const res = await t.http[m](path).set(auth(clerk)).set('Origin', ORIGIN).send({});
      expect(res.status, `${m} ${path}`).toBe(403);
    }
    for (const email of [DEMO.qa, DEMO.admin, DEMO.buyer]) {
      expect(
        (await t.http.get('/api/corrective-actions').set(auth(await t.token(email)))).status,
      ).toBe(200);
    }
  });
});

describe('versions of a SCAR (issue 17, item 7)', () => {
  it('answers a stale edit with 409 and the request as it is now, and lets one of two steps at once win', async () => {
    const supplier = await fx.supplier('Birchwood Cable Works');
    const created = await t.http.post('/api/corrective-actions').set(auth(buyer)).send({
      supplierId: supplier.id,
      lotIds: [],
      problem: 'Undersized conductors',
      dueOn: '2099-01-31',
    });
    expect(created.status).toBe(201);
    expect(created.body.version).toBe(1);
    const id = created.body.id;
    expect((await patch(id, { version: 1, dueOn: '2099-02-28' })).status).toBe(200);
    const stale = await patch(id, { version: 1, dueOn: '2099-03-31' });
    expect(stale.status).toBe(409);
    expect(stale.body.current).toMatchObject({ id, version: 2, dueOn: '2099-02-28' });
    const answer = {
      version: 2,
      status: 'responded',
      containment: 'Stock quarantined',
      rootCause: 'Die worn',
      correctiveAction: 'Die replaced',
    };
    const both = await Promise.all([patch(id, answer), patch(id, answer)]);
    expect(both.map((r) => r.status).sort()).toEqual([200, 409]);
    const now = await t.http.get(`/api/corrective-actions/${id}`).set(auth(buyer));
    expect(now.body).toMatchObject({ status: 'responded', version: 3 });
    const events = await t.http
      .get('/api/audit?entityType=corrective_action&action=corrective_action.update&pageSize=100')
      .set(auth(await t.token(DEMO.admin)));
    expect(events.status).toBe(200);
    const responded = events.body.items.filter(
      (e: { entityId: number; after: { status?: string } | null }) =>
        e.entityId === id && e.after?.status === 'responded',
    );
    expect(responded).toHaveLength(1); // the loser wrote nothing
  });
});
