import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Fixtures, startWithFixtures } from './helpers/decision-fixtures';
import { DEMO, type TestApp } from './helpers/test-app';

let t: TestApp;
let fx: Fixtures;
let qa: string;
beforeAll(async () => ({ t, fx, token: qa } = await startWithFixtures(DEMO.qa)));
afterAll(async () => t.close());

const LONG_REASON = 'Power conductor measured two sizes small on three units';
/** The terms a concession needs (issue 14 §7). */
const TERMS = {
  scope: 'Customer bench test only, labelled as such',
  quantity: 1,
  expiresOn: new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10),
};

async function decide(
  lotId: number,
  body: {
    outcome: string;
    reason?: string;
    version: number;
    approveReduced?: boolean;
    concession?: typeof TERMS;
  },
  token = qa,
) {
  return t.http
    .post(`/api/lots/${lotId}/decisions`)
    .set('Authorization', `Bearer ${token}`)
    .send({ reason: '', ...body });
}

async function stream() {
  const supplier = await fx.supplier();
  return fx.product(supplier.id);
}

describe('POST /api/lots/:id/decisions', () => {
  it('accepts a lot the plan accepts without a reason and records who decided', async () => {
    const product = await stream();
    const { lot } = await fx.lot(product.id);
    const res = await decide(lot.id, { outcome: 'accept', version: lot.version });
    expect(res.status).toBe(201);
    expect(res.body.decision).toMatchObject({
      outcome: 'accept',
      recommendation: 'accept',
      decidedBy: { name: expect.any(String) },
      lotVersion: lot.version,
      ncrNumber: null,
    });
    expect(res.body.lot).toMatchObject({
      id: lot.id,
      status: 'accepted',
      version: lot.version + 1,
    });
    expect(res.body.switching).toMatchObject({ from: 'normal', to: 'normal', changed: false });
  });

  it('needs a 20-character reason against the recommendation and for a concession', async () => {
    const product = await stream();
    const { lot } = await fx.lot(product.id, { nonconforming: 1 });
    const against = await decide(lot.id, {
      outcome: 'accept',
      reason: 'fine',
      version: lot.version,
    });
    expect(against.status).toBe(400);
    expect(against.body.message[0]).toMatch(
      /at least 20 characters.*against the recommendation \(reject\)/,
    );
    const concession = await decide(lot.id, {
      outcome: 'accept_on_concession',
      reason: 'short',
      version: lot.version,
    });
    expect(concession.status).toBe(400);
    expect(concession.body.message[0]).toMatch(/concession/);
    const following = await decide(lot.id, { outcome: 'reject', version: lot.version });
    expect(following.status).toBe(201);
    expect(following.body.decision.recommendation).toBe('reject');
  });

  it('refuses acceptance before every planned unit is tested; a concession needs its reason', async () => {
    const product = await stream();
    const { lot } = await fx.lot(product.id, { untested: 1 });
    // Acceptance needs every planned unit (ISO 2859-1; issue 13: only rejection is curtailed).
    const res = await decide(lot.id, {
      outcome: 'accept',
      reason: LONG_REASON,
      version: lot.version,
    });
    expect(res.status).toBe(422);
    expect(res.body.message).toMatch(/Acceptance needs every planned unit/);
    const short = await decide(lot.id, {
      outcome: 'accept_on_concession',
      reason: 'ok',
      version: lot.version,
    });
    expect(short.status).toBe(400);
    const withReason = await decide(lot.id, {
      outcome: 'accept_on_concession',
      reason: LONG_REASON,
      version: lot.version,
      concession: TERMS,
    });
    // Not against a reject (the evaluation is incomplete): no second approval is needed.
    expect(withReason.status).toBe(201);
    expect(withReason.body.decision.recommendation).toBe('incomplete');
  });

  it('refuses a lot still being inspected and an unknown lot', async () => {
    const product = await stream();
    const { lot } = await fx.lot(product.id, { status: 'inspecting' });
    const res = await decide(lot.id, { outcome: 'accept', version: lot.version });
    expect(res.status).toBe(422);
    expect(res.body.message).toMatch(/still on hold or being inspected/);
    expect((await decide(99999, { outcome: 'accept', version: 1 })).status).toBe(404);
  });

  it('validates the body field by field', async () => {
    const product = await stream();
    const { lot } = await fx.lot(product.id);
    const res = await decide(lot.id, { outcome: 'keep', version: 0 });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/outcome must be one of/),
        expect.stringMatching(/version must be a whole number/),
      ]),
    );
  });

  it('lets exactly one of two decisions raced on the same version win; the other gets 409 with the current lot', async () => {
    const product = await stream();
    const { lot } = await fx.lot(product.id, { nonconforming: 2 });
    const admin = await t.token(DEMO.admin);
    const [a, b] = await Promise.all([
      decide(lot.id, { outcome: 'reject', version: lot.version }),
      decide(lot.id, { outcome: 'reject', version: lot.version }, admin),
    ]);
    const statuses = [a.status, b.status].sort();
    expect(statuses).toEqual([201, 409]);
    const loser = a.status === 409 ? a : b;
    expect(loser.body.current).toMatchObject({
      id: lot.id,
      status: 'rejected',
      version: lot.version + 1,
    });
    const em = fx.em();
    const count = await em
      .getConnection()
      .execute('select count(*) as n from decisions where lot_id = ?', [lot.id]);
    expect(Number(count[0].n)).toBe(1);
  });

  it('appends a later decision that supersedes the earlier one', async () => {
    const product = await stream();
    const { lot } = await fx.lot(product.id, { nonconforming: 1 });
    const first = await decide(lot.id, { outcome: 'reject', version: lot.version });
    expect(first.status).toBe(201);
    const asked = await decide(lot.id, {
      outcome: 'accept_on_concession',
      reason: 'Used for a customer bench test only, labelled as such',
      version: first.body.lot.version,
      concession: TERMS,
    });
    // Against a reject: an admin approves it (the product's default policy).
    expect(asked.status).toBe(202);
    const second = await t.http
      .post(`/api/concessions/${asked.body.concession.id}/approve`)
      .set('Authorization', `Bearer ${await t.token(DEMO.admin)}`)
      .send({ version: asked.body.concession.version });
    expect(second.status).toBe(200);
    expect(second.body.lot.status).toBe('accepted_on_concession');
    const stale = await decide(lot.id, { outcome: 'reject', version: first.body.lot.version });
    expect(stale.status).toBe(409);
    // a concession still counts as not accepted: the stream's window holds one not-accepted lot
    const state = await fx.inspectionState(product.id);
    expect((state.state as { recentNormalLots: boolean[] }).recentNormalLots).toEqual([false]);
  });
});

describe('nonconformance reports', () => {
  it('numbers NCRs NCR-<year>-NNNN in sequence', async () => {
    const year = new Date().getUTCFullYear();
    const product = await stream();
    const numbers: string[] = [];
    for (let i = 0; i < 3; i++) {
      const { lot } = await fx.lot(product.id, { nonconforming: 1 });
      const res = await decide(lot.id, { outcome: 'reject', version: lot.version });
      expect(res.status).toBe(201);
      numbers.push(res.body.ncrNumber as string);
    }
    for (const n of numbers) expect(n).toMatch(new RegExp(`^NCR-${year}-\\d{4}$`));
    const seqs = numbers.map((n) => Number(n.slice(-4)));
    expect(seqs[1]).toBe(seqs[0] + 1);
    expect(seqs[2]).toBe(seqs[0] + 2);
  });

  it('numbers rejects decided in parallel on different lots without a gap or a duplicate', async () => {
    const product = await stream();
    const lots = await Promise.all([1, 2, 3].map(() => fx.lot(product.id, { nonconforming: 1 })));
    const results = await Promise.all(
      lots.map(({ lot }) => decide(lot.id, { outcome: 'reject', version: lot.version })),
    );
    expect(results.map((r) => r.status)).toEqual([201, 201, 201]);
    const seqs = results
      .map((r) => Number((r.body.ncrNumber as string).slice(-4)))
      .sort((x, y) => x - y);
    expect(new Set(seqs).size).toBe(3);
    expect(seqs[2] - seqs[0]).toBe(2);
  });
});

describe('switching state across a run of lots (ISO 2859-1)', () => {
  async function run(
    productId: number,
    outcomes: ('accept' | 'reject')[],
    severity: 'normal' | 'tightened' = 'normal',
  ) {
    const results = [];
    for (const outcome of outcomes) {
      const { lot } = await fx.lot(productId, {
        nonconforming: outcome === 'reject' ? 1 : 0,
        severity,
      });
      const res = await decide(lot.id, { outcome, version: lot.version });
      expect(res.status).toBe(201);
      results.push(res.body);
    }
    return results;
  }

  it('tightens at 2 not accepted in 5, relaxes after 5 accepted, discontinues at 5 not accepted on tightened, then restores to tightened', async () => {
    const product = await stream();
    const first = await run(product.id, ['accept', 'reject', 'accept', 'reject']);
    expect(first.map((r) => r.switching.to)).toEqual(['normal', 'normal', 'normal', 'tightened']);
    expect(first[3].switching).toMatchObject({ from: 'normal', changed: true });
    expect(first[3].switching.message).toMatch(/2 of the last 4 lots were not accepted/);
    expect((await fx.inspectionState(product.id)).severity).toBe('tightened');

    const relax = await run(
      product.id,
      ['accept', 'accept', 'accept', 'accept', 'accept'],
      'tightened',
    );
    expect(relax.map((r) => r.switching.to)).toEqual([
      'tightened',
      'tightened',
      'tightened',
      'tightened',
      'normal',
    ]);

    await run(product.id, ['reject', 'reject']);
    expect((await fx.inspectionState(product.id)).severity).toBe('tightened');
    const stop = await run(
      product.id,
      ['reject', 'reject', 'reject', 'reject', 'reject'],
      'tightened',
    );
    expect(stop.map((r) => r.switching.to)).toEqual([
      'tightened',
      'tightened',
      'tightened',
      'tightened',
      'discontinued',
    ]);
    expect(stop[4].switching.message).toMatch(/discontinued.*New lots of this product are refused/);
    const state = await fx.inspectionState(product.id);
    expect(state.severity).toBe('discontinued');
    expect(state.reason).toMatch(/5 lots not accepted on tightened/);

    const short = await t.http
      .post(`/api/products/${product.id}/inspection-state/restore`)
      .set('Authorization', `Bearer ${qa}`)
      .send({ reason: 'fixed' });
    expect(short.status).toBe(400);
    const restored = await t.http
      .post(`/api/products/${product.id}/inspection-state/restore`)
      .set('Authorization', `Bearer ${qa}`)
      .send({ reason: 'SCAR answered: new drawing die and incoming copper check at the mill' });
    expect(restored.status).toBe(201);
    expect(restored.body).toMatchObject({ productId: product.id, severity: 'tightened' });
    expect(restored.body.switching).toMatchObject({ from: 'discontinued', to: 'tightened' });
    const again = await t.http
      .post(`/api/products/${product.id}/inspection-state/restore`)
      .set('Authorization', `Bearer ${qa}`)
      .send({ reason: 'SCAR answered: new drawing die and incoming copper check at the mill' });
    expect(again.status).toBe(422);
  });

  it('offers reduced inspection at a switching score of 30 and switches only with the QA lead approval', async () => {
    const product = await stream();
    // Ac 0 plans (code D at AQL 2.5): each accepted lot adds 2 to the score (ISO 2859-1, from memory)
    const fourteen = await run(product.id, Array(14).fill('accept'));
    expect(fourteen[13].switching.reducedAvailable).toBe(false);
    const [fifteenth] = await run(product.id, ['accept']);
    expect(fifteenth.switching).toMatchObject({
      to: 'normal',
      changed: false,
      reducedAvailable: true,
    });
    expect(fifteenth.switching.message).toMatch(/Reduced inspection is available/);
    expect((await fx.inspectionState(product.id)).severity).toBe('normal');

    const { lot } = await fx.lot(product.id);
    const approved = await decide(lot.id, {
      outcome: 'accept',
      version: lot.version,
      approveReduced: true,
    });
    expect(approved.body.switching).toMatchObject({ from: 'normal', to: 'reduced', changed: true });
    expect((await fx.inspectionState(product.id)).severity).toBe('reduced');
  });
});

describe('roles', () => {
  it('lets only qa_lead and admin decide and restore', async () => {
    const product = await stream();
    const { lot } = await fx.lot(product.id);
    for (const email of [DEMO.clerk, DEMO.buyer]) {
      const token = await t.token(email);
      expect(
        (await decide(lot.id, { outcome: 'accept', version: lot.version }, token)).status,
      ).toBe(403);
      const restore = await t.http
        .post(`/api/products/${product.id}/inspection-state/restore`)
        .set('Authorization', `Bearer ${token}`)
        .send({ reason: 'SCAR answered with a new process at the mill' });
      expect(restore.status).toBe(403);
    }
    expect((await t.http.post(`/api/lots/${lot.id}/decisions`).send({})).status).toBe(401);
    const admin = await t.token(DEMO.admin);
    expect((await decide(lot.id, { outcome: 'accept', version: lot.version }, admin)).status).toBe(
      201,
    );
  });
});
