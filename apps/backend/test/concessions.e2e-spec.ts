import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Fixtures } from './helpers/decision-fixtures';
import { pdfTool } from './helpers/pdf';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
let fx: Fixtures;
const SECOND_QA = 'second.qa@demo.example';
beforeAll(async () => {
  t = await startTestApp();
  fx = new Fixtures(t);
  const made = await t.http
    .post('/api/users')
    .set(await auth(DEMO.admin))
    .send({
      email: SECOND_QA,
      name: 'Noor Abernethy',
      role: 'qa_lead',
      password: 'another-long-passphrase',
    });
  expect(made.status, JSON.stringify(made.body)).toBe(201);
});
afterAll(() => t.close());

async function auth(email: string) {
  if (email === SECOND_QA) {
    const res = await t.http
      .post('/api/auth/login')
      .send({ email, password: 'another-long-passphrase' });
    return { Authorization: `Bearer ${res.body.accessToken}` };
  }
  return { Authorization: `Bearer ${await t.token(email)}` };
}

/** The text of a PDF through poppler's pdftotext. */
const pdfText = (pdf: Buffer) => pdfTool(t.dir, 'pdftotext', pdf, ['-layout']);

const inDays = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10);
const TERMS = {
  scope: 'Ground runs of 1 m or less in the bench kits; not for power or fused runs',
  quantity: 40,
  expiresOn: inDays(30),
};
const REASON = 'The ground conductor carries no load current; the power side is refused.';

/** A lot of 200 kits whose recommendation is reject (2 nonconforming, S-3 AQL 2.5 plan). */
async function rejectLot(name: string) {
  const supplier = await fx.supplier(name);
  const product = await fx.product(supplier.id);
  const { lot } = await fx.lot(product.id, { nonconforming: 2 });
  return { lot, product };
}

const decide = async (lotId: number, body: Record<string, unknown>, who: string = DEMO.qa) =>
  t.http
    .post(`/api/lots/${lotId}/decisions`)
    .set(await auth(who))
    .send(body);

describe('concessions with terms', () => {
  it('refuses a concession without terms, or with terms past the lot or in the past, naming the field', async () => {
    const { lot } = await rejectLot('Juniper Wire Works');
    const base = { outcome: 'accept_on_concession', reason: REASON, version: lot.version };
    const none = await decide(lot.id, base);
    expect(none.status).toBe(400);
    expect(none.body.errors).toEqual([
      {
        field: 'concession',
        message: 'concession must give the terms: scope, quantity and expiresOn',
      },
    ]);
    const short = await decide(lot.id, { ...base, concession: { ...TERMS, scope: 'ground' } });
    expect(short.status).toBe(400);
    expect(short.body.errors[0].field).toBe('concession.scope');
    const much = await decide(lot.id, { ...base, concession: { ...TERMS, quantity: 201 } });
    expect(much.status).toBe(400);
    expect(much.body.errors).toEqual([
      {
        field: 'concession.quantity',
        message: "concession.quantity must be at most the lot's 200 kits",
      },
    ]);
    const past = await decide(lot.id, {
      ...base,
      concession: { ...TERMS, expiresOn: '2026-01-31' },
    });
    expect(past.status).toBe(400);
    expect(past.body.errors[0]).toEqual({
      field: 'concession.expiresOn',
      message: 'concession.expiresOn must be today or later',
    });
    const unreal = await decide(lot.id, {
      ...base,
      concession: { ...TERMS, expiresOn: '2027-02-30' },
    });
    expect(unreal.body.errors[0].field).toBe('concession.expiresOn');
    const lotNow = await t.http.get(`/api/lots/${lot.id}`).set(await auth(DEMO.qa));
    expect(lotNow.body.status).toBe('awaiting_decision');
  });

  it('against a reject: waits for a second QA lead or an admin, never the requester, then puts the terms in force and prints them on the tag', async () => {
    const { lot } = await rejectLot('Kingsmoor Cable');
    const asked = await decide(lot.id, {
      outcome: 'accept_on_concession',
      reason: REASON,
      version: lot.version,
      concession: TERMS,
    });
    expect(asked.status, JSON.stringify(asked.body)).toBe(202);
    expect(asked.body).toMatchObject({
      pendingApproval: true,
      decision: null,
      lot: { status: 'awaiting_decision' },
      concession: {
        status: 'pending',
        scope: TERMS.scope,
        quantity: 40,
        unit: 'kits',
        expiresOn: TERMS.expiresOn,
        recommendation: 'reject',
        needsSecondApproval: true,
        requestedBy: { name: expect.any(String) },
        reviewedBy: null,
      },
    });
    const c = asked.body.concession;
    // Nothing else is decided meanwhile.
    const other = await decide(lot.id, { outcome: 'reject', reason: '', version: lot.version });
    expect(other.status).toBe(422);
    expect(other.body.message).toMatch(/waits for approval/);

    const approve = async (who: string, body: Record<string, unknown>) =>
      t.http
        .post(`/api/concessions/${c.id}/approve`)
        .set(await auth(who))
        .send(body);
    const self = await approve(DEMO.qa, { version: c.version });
    expect(self.status).toBe(422);
    expect(self.body.message).toBe(
      'You asked for this concession: a second QA lead or an admin must approve it',
    );
    expect((await approve(DEMO.clerk, { version: c.version })).status).toBe(403);
    expect((await approve(DEMO.buyer, { version: c.version })).status).toBe(403);
    expect((await approve(SECOND_QA, { version: c.version + 7 })).status).toBe(409);
    const ok = await approve(SECOND_QA, {
      version: c.version,
      note: 'Agreed for ground runs only.',
    });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body).toMatchObject({
      pendingApproval: false,
      lot: { status: 'accepted_on_concession' },
      decision: { outcome: 'accept_on_concession', reason: REASON },
      concession: {
        status: 'approved',
        reviewedBy: { name: 'Noor Abernethy' },
        reviewNote: 'Agreed for ground runs only.',
      },
    });
    // The decision is the requester's; the approver is on the concession.
    expect(ok.body.decision.decidedBy.name).toBe(asked.body.concession.requestedBy.name);
    expect((await approve(SECOND_QA, { version: ok.body.concession.version })).status).toBe(422);

    const list = await t.http.get(`/api/lots/${lot.id}/concessions`).set(await auth(DEMO.clerk));
    expect(list.body).toHaveLength(1);
    expect(list.body[0]).toMatchObject({ status: 'approved', decisionId: ok.body.decision.id });
    const audit = await t.http
      .get('/api/audit?action=concession.approve')
      .set(await auth(DEMO.admin));
    expect(audit.body.items[0]).toMatchObject({
      lotId: lot.id,
      after: { status: 'approved', decisionId: ok.body.decision.id },
    });

    const tag = await t.http
      .get(`/api/lots/${lot.id}/tag.pdf`)
      .set(await auth(DEMO.clerk))
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (d: Buffer) => chunks.push(d));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(tag.status).toBe(200);
    const text = pdfText(tag.body as Buffer).replace(/\s+/g, ' ');
    expect(text).toContain('MAY BE USED ONLY FOR');
    expect(text).toContain('Ground runs of 1 m or less');
    expect(text).toContain('40 kits');
    expect(text).toContain(TERMS.expiresOn);
    expect(text).toContain('Noor Abernethy');
  });

  it('an admin approves too; a refusal needs a note and leaves the lot to be decided', async () => {
    const { lot } = await rejectLot('Lindenfield Conductors');
    const asked = await decide(lot.id, {
      outcome: 'accept_on_concession',
      reason: REASON,
      version: lot.version,
      concession: TERMS,
    });
    const c = asked.body.concession;
    const bare = await t.http
      .post(`/api/concessions/${c.id}/refuse`)
      .set(await auth(DEMO.admin))
      .send({ version: c.version });
    expect(bare.status).toBe(400);
    expect(bare.body.errors).toEqual([
      { field: 'note', message: 'note must say in at least 10 characters why' },
    ]);
    const refused = await t.http
      .post(`/api/concessions/${c.id}/refuse`)
      .set(await auth(DEMO.admin))
      .send({ version: c.version, note: 'Kits go out as sets; no split use is possible.' });
    expect(refused.status).toBe(200);
    expect(refused.body).toMatchObject({
      status: 'refused',
      reviewedBy: { name: expect.any(String) },
    });
    const rejected = await decide(lot.id, { outcome: 'reject', reason: '', version: lot.version });
    expect(rejected.status).toBe(201);

    const { lot: lot2 } = await rejectLot('Lindenfield Conductors Two');
    const asked2 = await decide(lot2.id, {
      outcome: 'accept_on_concession',
      reason: REASON,
      version: lot2.version,
      concession: TERMS,
    });
    const byAdmin = await t.http
      .post(`/api/concessions/${asked2.body.concession.id}/approve`)
      .set(await auth(DEMO.admin))
      .send({ version: asked2.body.concession.version });
    expect(byAdmin.status).toBe(200);
    expect(byAdmin.body.lot.status).toBe('accepted_on_concession');
  });

  it("with the product's policy off (QA only), the deciding QA lead approves it at once", async () => {
    const { lot, product } = await rejectLot('Meadowrun Wire');
    const byBuyer = await t.http
      .patch(`/api/products/${product.id}`)
      .set(await auth(DEMO.buyer))
      .send({ concessionNeedsApproval: false, version: product.version });
    expect(byBuyer.status).toBe(403);
    const off = await t.http
      .patch(`/api/products/${product.id}`)
      .set(await auth(DEMO.qa))
      .send({ concessionNeedsApproval: false, version: product.version });
    expect(off.status, JSON.stringify(off.body)).toBe(200);
    expect(off.body.concessionNeedsApproval).toBe(false);
    const res = await decide(lot.id, {
      outcome: 'accept_on_concession',
      reason: REASON,
      version: lot.version,
      concession: TERMS,
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      pendingApproval: false,
      lot: { status: 'accepted_on_concession' },
      concession: { status: 'approved', needsSecondApproval: false },
    });
    expect(res.body.concession.reviewedBy).toEqual(res.body.concession.requestedBy);
  });
  it("leaves Today's reject-number list while its concession waits for a second approval, and comes back when it is refused", async () => {
    const { lot } = await rejectLot('Oakhollow Wire');
    const atReject = async () => {
      const res = await t.http.get('/api/inspection/reject-reached').set(await auth(DEMO.admin));
      expect(res.status).toBe(200);
      return res.body.items.map((l: { id: number }) => l.id);
    };
    expect(await atReject()).toContain(lot.id);
    const asked = await decide(lot.id, {
      outcome: 'accept_on_concession',
      reason: REASON,
      version: lot.version,
      concession: TERMS,
    });
    expect(asked.status, JSON.stringify(asked.body)).toBe(202);
    const c = asked.body.concession;
    // Decided as far as its requester can: it waits among the concessions, not as a lot to decide.
    expect(await atReject()).not.toContain(lot.id);
    const awaiting = await t.http
      .get('/api/concessions/awaiting-approval')
      .set(await auth(DEMO.admin));
    expect(awaiting.body.items.map((a: { lot: { id: number } }) => a.lot.id)).toContain(lot.id);
    const refused = await t.http
      .post(`/api/concessions/${c.id}/refuse`)
      .set(await auth(DEMO.admin))
      .send({ version: c.version, note: 'Kits go out as sets; no split use is possible.' });
    expect(refused.status).toBe(200);
    expect(await atReject()).toContain(lot.id);
  });
});
