import { writeFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditService } from '../src/audit/audit.service';
import { Sample } from '../src/inspection/entities/sample.entity';
import { auth } from './helpers/api';
import { Fixtures, startWithFixtures } from './helpers/decision-fixtures';
import { collect, pdfTool } from './helpers/pdf';
import { DEMO, ORIGIN, type TestApp } from './helpers/test-app';

let t: TestApp;
let fx: Fixtures;
let qa: string;
beforeAll(async () => ({ t, fx, token: qa } = await startWithFixtures(DEMO.qa)));
afterAll(async () => t.close());

/** The text of a PDF through poppler's pdftotext. */
const pdfText = (pdf: Buffer) => pdfTool(t.dir, 'pdftotext', pdf, ['-layout']);

/** A rejected lot whose reading of unit 1 (power) was recorded through the audit trail. */
async function rejectedLot() {
  const supplier = await fx.supplier('Harbor Wire Supply', 'qa@harbor-wire.example');
  const product = await fx.product(supplier.id);
  const { lot } = await fx.lot(product.id, { nonconforming: 1 });
  const em = fx.em();
  const sample = await em.findOneOrFail(Sample, {
    lot: lot.id,
    seq: 1,
    conductor: { purpose: 'power' },
  });
  t.app.get(AuditService).record(
    em,
    { id: 1, email: DEMO.clerk, name: 'x', role: 'clerk' },
    {
      action: 'reading.create',
      entityType: 'reading',
      entityId: 1,
      lotId: lot.id,
      after: { sampleId: sample.id, method: 'mass', measuresAs: '8 AWG', verdict: 'nonconforming' },
    },
  );
  await em.flush();
  const res = await t.http
    .post(`/api/lots/${lot.id}/decisions`)
    .set(auth(qa))
    .send({ outcome: 'reject', reason: 'Power measures as 8 AWG', version: lot.version });
  expect(res.status).toBe(201);
  return { lot, product, supplier, ncrNumber: res.body.ncrNumber as string };
}

describe('GET /api/lots/:id/timeline', () => {
  it('lists the lot events oldest first with a sentence each', async () => {
    const { lot, ncrNumber } = await rejectedLot();
    const res = await t.http
      .get(`/api/lots/${lot.id}/timeline`)
      .set(auth(await t.token(DEMO.clerk)));
    expect(res.status).toBe(200);
    const actions = res.body.map((e: { action: string }) => e.action);
    expect(actions).toEqual(['reading.create', 'ncr.create', 'decision.create']);
    const [reading, ncr, decision] = res.body;
    expect(reading.summary).toMatch(
      /recorded a mass reading on unit 1 \(power\): measures as 8 AWG, nonconforming$/,
    );
    expect(ncr.summary).toMatch(new RegExp(`opened nonconformance report ${ncrNumber}`));
    expect(decision).toMatchObject({
      actor: { id: expect.any(Number) },
      actorEmail: DEMO.qa,
      entityType: 'decision',
    });
    expect(decision.summary).toMatch(
      /rejected the lot \(recommendation: reject\): Power measures as 8 AWG/,
    );
    expect(decision.before).toMatchObject({ status: 'awaiting_decision' });
    expect(decision.after).toMatchObject({ status: 'rejected', ncrNumber });
    const times = res.body.map((e: { at: string }) => Date.parse(e.at));
    expect([...times].sort((a, b) => a - b)).toEqual(times);
  });

  it('answers 404 for an unknown lot and needs a signed-in user', async () => {
    expect((await t.http.get('/api/lots/99999/timeline').set(auth(qa))).status).toBe(404);
    expect((await t.http.get('/api/lots/1/timeline')).status).toBe(401);
  });
});

describe('GET /api/audit (admin)', () => {
  it('filters by action, entity type, actor and time, paged', async () => {
    await rejectedLot();
    const admin = await t.token(DEMO.admin);
    const all = await t.http.get('/api/audit?action=decision.create&pageSize=1').set(auth(admin));
    expect(all.status).toBe(200);
    expect(all.body).toMatchObject({ page: 1, pageSize: 1 });
    expect(all.body.total).toBeGreaterThanOrEqual(2);
    expect(all.body.items).toHaveLength(1);
    expect(all.body.items[0].action).toBe('decision.create');
    const qaId = all.body.items[0].actor.id as number;
    const mine = await t.http
      .get(`/api/audit?actorId=${qaId}&entityType=nonconformance`)
      .set(auth(admin));
    expect(
      mine.body.items.every(
        (e: { entityType: string; actor: { id: number } }) =>
          e.entityType === 'nonconformance' && e.actor.id === qaId,
      ),
    ).toBe(true);
    expect(mine.body.total).toBeGreaterThanOrEqual(2);
    const past = await t.http.get('/api/audit?to=2000-01-01').set(auth(admin));
    expect(past.body.total).toBe(0);
    const today = new Date().toISOString().slice(0, 10);
    const since = await t.http
      .get(`/api/audit?from=${today}&to=${today}&action=ncr.create`)
      .set(auth(admin));
    expect(since.body.total).toBeGreaterThanOrEqual(2);
    const bad = await t.http.get('/api/audit?from=yesterday').set(auth(admin));
    expect(bad.status).toBe(400);
  });

  it('is for admin only and offers no route that changes or deletes events', async () => {
    for (const email of [DEMO.clerk, DEMO.qa, DEMO.buyer]) {
      expect((await t.http.get('/api/audit').set(auth(await t.token(email)))).status).toBe(403);
    }
    const admin = await t.token(DEMO.admin);
    for (const m of ['delete', 'patch', 'put'] as const) {
      expect((await t.http[m]('/api/audit/1').set(auth(admin)).set('Origin', ORIGIN)).status).toBe(
        404,
      );
    }
  });
});

describe('the audit screen: one record, facets and CSV (admin)', () => {
  it('filters to one record by type and id, and lists the actions, types and people', async () => {
    await rejectedLot();
    const admin = await t.token(DEMO.admin);
    const latest = await t.http
      .get('/api/audit?action=decision.create&pageSize=1')
      .set(auth(admin));
    const decisionId = latest.body.items[0].entityId as number;
    const one = await t.http
      .get(`/api/audit?entityType=decision&entityId=${decisionId}`)
      .set(auth(admin));
    expect(one.status).toBe(200);
    expect(one.body.total).toBeGreaterThanOrEqual(1);
    for (const e of one.body.items) {
      expect([e.entityType, e.entityId]).toEqual(['decision', decisionId]);
    }
    const bad = await t.http.get('/api/audit?entityId=abc').set(auth(admin));
    expect(bad.status).toBe(400);
    expect(bad.body.errors.length).toBeGreaterThan(0);
    expect(bad.body.errors.every((e: { field: string }) => e.field === 'entityId')).toBe(true);
    const backwards = await t.http.get('/api/audit?from=2026-02-01&to=2026-01-01').set(auth(admin));
    expect(backwards.status).toBe(400);

    const facets = await t.http.get('/api/audit/facets').set(auth(admin));
    expect(facets.status).toBe(200);
    expect(facets.body.actions).toEqual(expect.arrayContaining(['decision.create', 'ncr.create']));
    expect(facets.body.entityTypes).toEqual(expect.arrayContaining(['decision', 'nonconformance']));
    expect(facets.body.people.map((p: { email: string }) => p.email)).toContain(DEMO.qa);
    for (const email of [DEMO.clerk, DEMO.qa, DEMO.buyer]) {
      const token = await t.token(email);
      expect((await t.http.get('/api/audit/facets').set(auth(token))).status).toBe(403);
      expect((await t.http.get('/api/audit/export.csv').set(auth(token))).status).toBe(403);
    }
    expect((await t.http.get('/api/audit/export.csv')).status).toBe(401);
  });

  it('exports the filtered events through the CSV writer and audits the export', async () => {
    const { lot } = await rejectedLot();
    const admin = await t.token(DEMO.admin);
    const list = await t.http
      .get(`/api/audit?action=decision.create&pageSize=100`)
      .set(auth(admin));
    const res = await t.http
      .get('/api/audit/export.csv?action=decision.create')
      .set(auth(admin))
      .buffer(true)
      .parse(collect);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename="audit-trail.csv"');
    const text = (res.body as Buffer).toString('utf8').replace(/^\ufeff/, '');
    const lines = text.trim().split(/\r?\n/);
    expect(lines[0]).toBe(
      'eventId,at,actorId,actorEmail,actorName,action,entityType,entityId,lotId,summary,before,after',
    );
    expect(lines).toHaveLength(1 + list.body.total);
    expect(lines.slice(1).every((l) => l.includes(',decision.create,decision,'))).toBe(true);
    expect(text).toContain(`,${lot.id},`);

    const exported = await t.http.get('/api/audit?action=audit.export').set(auth(admin));
    expect(exported.body.total).toBeGreaterThanOrEqual(1);
    expect(exported.body.items[0]).toMatchObject({
      actorEmail: DEMO.admin,
      after: { filters: { action: 'decision.create' }, rows: list.body.total },
    });
  });
});

describe('GET /api/lots/:id/tag.pdf', () => {
  it('prints a REJECTED tag with lot, PO, NCR and QR code link', async () => {
    const { lot, ncrNumber } = await rejectedLot();
    const res = await t.http
      .get(`/api/lots/${lot.id}/tag.pdf`)
      .set(auth(await t.token(DEMO.clerk)))
      .buffer(true)
      .parse(collect);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const text = pdfText(pdf);
    for (const want of [
      'REJECTED',
      `LOT ${lot.id}`,
      lot.poNumber,
      ncrNumber,
      'Harbor Wire Supply',
      `${ORIGIN}/lots/${lot.id}`,
    ]) {
      expect(text).toContain(want);
    }
    if (process.env.KEEP_TAG) writeFileSync(process.env.KEEP_TAG, pdf);
  });

  it('prints HOLD for a lot awaiting decision', async () => {
    const supplier = await fx.supplier();
    const product = await fx.product(supplier.id);
    const { lot } = await fx.lot(product.id);
    const res = await t.http
      .get(`/api/lots/${lot.id}/tag.pdf`)
      .set(auth(qa))
      .buffer(true)
      .parse(collect);
    expect(res.status).toBe(200);
    const text = pdfText(res.body as Buffer);
    expect(text).toMatch(/HOLD[\s\S]*Do not use until the QA lead decides[\s\S]*not decided yet/);
    // A held lot's QR code opens bench mode.
    expect(text).toContain(`${ORIGIN}/lots/${lot.id}/bench`);
    expect((await t.http.get('/api/lots/99999/tag.pdf').set(auth(qa))).status).toBe(404);
  });
});
