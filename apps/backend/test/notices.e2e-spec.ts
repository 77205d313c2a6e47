import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { EntityManager } from '@mikro-orm/core';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApp } from '../src/app.factory';
import { CorrectiveAction } from '../src/corrective-actions/entities/corrective-action.entity';
import { OutboundMessage } from '../src/mail/entities/outbound-message.entity';
import { Notice } from '../src/notices/entities/notice.entity';
import { NoticesService } from '../src/notices/notices.service';
import { Fixtures, rejectedLot } from './helpers/decision-fixtures';
import { startMailDev, type MailDev, type MailDevEmail } from './helpers/maildev';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
let fx: Fixtures;
let mail: MailDev;
beforeAll(async () => {
  mail = await startMailDev();
  // The job is driven by the test (NOTICE_POLL_MS 0): each round is called with its clock.
  t = await startTestApp({ SMTP_URL: mail.smtpUrl, NOTICE_POLL_MS: '0', DIGEST_HOUR_UTC: '6' });
  fx = new Fixtures(t);
});
afterAll(async () => {
  await t.close();
  await mail.stop();
});

const auth = async (email: string) => ({ Authorization: `Bearer ${await t.token(email)}` });
const notices = (app: INestApplication = t.app) => app.get(NoticesService);
const em = () => t.app.get(EntityManager).fork();

/** The e-mails MailDev holds for `to` whose subject matches, waiting a little for them. */
async function mailsTo(to: string, subject: RegExp, atLeast = 1): Promise<MailDevEmail[]> {
  let found: MailDevEmail[] = [];
  for (let i = 0; i < 60; i++) {
    found = (await mail.emails()).filter(
      (e) => e.to.some((a) => a.address === to) && subject.test(e.subject),
    );
    if (found.length >= atLeast) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  return found;
}

async function setChoices(email: string, change: Record<string, unknown>) {
  const res = await t.http
    .patch('/api/me/notices')
    .set(await auth(email))
    .send(change);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
}

describe('e-mail notices', () => {
  it("offers each role its own notices, on by default, and saves a user's switches (audited)", async () => {
    const qa = await t.http.get('/api/me/notices').set(await auth(DEMO.qa));
    expect(qa.body).toEqual({
      choices: {
        lotAwaitsDecision: true,
        lotRejectNumber: true,
        lotRejected: false,
        scarOverdue: false,
        scarAnswered: false,
        concessionAwaitsApproval: true,
        digest: false,
      },
      offered: ['lotAwaitsDecision', 'lotRejectNumber', 'concessionAwaitsApproval'],
      digestHourUtc: 6,
    });
    const buyer = await t.http.get('/api/me/notices').set(await auth(DEMO.buyer));
    expect(buyer.body.offered).toEqual(['lotRejected', 'scarOverdue', 'scarAnswered']);
    expect(buyer.body.choices).toMatchObject({
      lotRejected: true,
      scarOverdue: true,
      scarAnswered: true,
    });
    const clerk = await t.http.get('/api/me/notices').set(await auth(DEMO.clerk));
    expect(clerk.body.offered).toEqual([]);
    const admin = await t.http.get('/api/me/notices').set(await auth(DEMO.admin));
    expect(admin.body.offered).toHaveLength(6);
    // An admin may approve a concession: that notice is on; the others wait to be switched on.
    const { concessionAwaitsApproval, ...rest } = admin.body.choices;
    expect(concessionAwaitsApproval).toBe(true);
    expect(Object.values(rest).every((v) => v === false)).toBe(true);

    const bad = await t.http
      .patch('/api/me/notices')
      .set(await auth(DEMO.qa))
      .send({ lotAwaitsDecision: 'yes' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors).toEqual([
      { field: 'lotAwaitsDecision', message: 'lotAwaitsDecision must be true or false' },
    ]);
    const saved = await setChoices(DEMO.qa, { lotAwaitsDecision: false });
    expect(saved.choices).toMatchObject({ lotAwaitsDecision: false, lotRejectNumber: true });
    expect((await t.http.get('/api/me/notices').set(await auth(DEMO.qa))).body.choices).toEqual(
      saved.choices,
    );
    const audit = await t.http
      .get('/api/audit?action=notice_settings.update')
      .set(await auth(DEMO.admin));
    expect(audit.body.items[0]).toMatchObject({
      before: { lotAwaitsDecision: true },
      after: { lotAwaitsDecision: false },
    });
    await setChoices(DEMO.qa, { lotAwaitsDecision: true });
  });

  it('tells purchasing when a lot is rejected, and an admin who switched it on; nobody who switched it off', async () => {
    await setChoices(DEMO.admin, { lotRejected: true });
    const supplier = await fx.supplier('Fernhill Cable');
    const product = await fx.product(supplier.id);
    const { lot } = await rejectedLot(t, fx, product.id);
    const subject = new RegExp(`^Lot ${lot.id} was rejected`);
    const [toBuyer] = await mailsTo(DEMO.buyer, subject);
    expect(toBuyer.text).toContain(`PO ${lot.poNumber}`);
    expect(toBuyer.text).toContain(`${t.config.publicUrl}/lots/${lot.id}`);
    expect(toBuyer.text).toContain(`${t.config.publicUrl}/profile`);
    expect(await mailsTo(DEMO.admin, subject)).toHaveLength(1);
    // Not the QA lead, who decided it and has no such switch.
    expect(await mailsTo(DEMO.qa, subject, 0)).toHaveLength(0);

    await setChoices(DEMO.admin, { lotRejected: false });
    const second = await rejectedLot(t, fx, product.id);
    await mailsTo(DEMO.buyer, new RegExp(`^Lot ${second.lot.id} was rejected`));
    expect(await mailsTo(DEMO.admin, new RegExp(`^Lot ${second.lot.id} `), 0)).toHaveLength(0);
    // Notices are staff mail: the Messages screen (mail to suppliers) does not list them.
    const list = await t.http.get('/api/messages').set(await auth(DEMO.buyer));
    expect(list.body.items.some((m: { subject: string }) => subject.test(m.subject))).toBe(false);
  });

  it('tells QA leads once when a lot awaits a decision or reaches its reject number, however often the job runs', async () => {
    const supplier = await fx.supplier('Gorse Lane Wire');
    const product = await fx.product(supplier.id);
    const { lot: atReject } = await fx.lot(product.id, { nonconforming: 2 });
    const { lot: plain } = await fx.lot(product.id, { nonconforming: 0 });
    await notices().tick(new Date());
    await notices().tick(new Date());
    const [reject] = await mailsTo(
      DEMO.qa,
      new RegExp(`^Lot ${atReject.id} reached its reject number`),
    );
    expect(reject.text).toMatch(/2 nonconforming of \d+ tested/);
    expect(
      await mailsTo(DEMO.qa, new RegExp(`^Lot ${plain.id} awaits your decision`)),
    ).toHaveLength(1);
    // Once per event, whatever the number of rounds (and servers).
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailsTo(DEMO.qa, new RegExp(`^Lot ${atReject.id} `), 2)).toHaveLength(1);

    // A QA lead who wants only the reject number gets no plain "awaits" notice.
    await setChoices(DEMO.qa, { lotAwaitsDecision: false });
    const { lot: quiet } = await fx.lot(product.id, { nonconforming: 0 });
    const { lot: loud } = await fx.lot(product.id, { nonconforming: 3 });
    await notices().tick(new Date());
    await mailsTo(DEMO.qa, new RegExp(`^Lot ${loud.id} reached its reject number`));
    expect(await mailsTo(DEMO.qa, new RegExp(`^Lot ${quiet.id} `), 0)).toHaveLength(0);
    await setChoices(DEMO.qa, { lotAwaitsDecision: true });
  });

  it('tells purchasing once when a SCAR falls overdue and when the supplier answers it', async () => {
    const supplier = await fx.supplier('Hazelmere Conductors', 'quality@hazelmere.example');
    const product = await fx.product(supplier.id);
    const { lot } = await rejectedLot(t, fx, product.id);
    const buyer = await auth(DEMO.buyer);
    const car = await t.http
      .post('/api/corrective-actions')
      .set(buyer)
      .send({
        supplierId: supplier.id,
        lotIds: [lot.id],
        problem: '4 AWG spools measure as 8 AWG: about 40 % of the copper',
        dueOn: new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10),
      });
    expect(car.status).toBe(201);
    await notices().tick(new Date());
    const overdueSubject = new RegExp(`^${car.body.number} is overdue`);
    expect(await mailsTo(DEMO.buyer, overdueSubject, 0)).toHaveLength(0);
    // Its date passes.
    await em().nativeUpdate(CorrectiveAction, { id: car.body.id }, { dueOn: '2026-01-05' });
    await notices().tick(new Date());
    await notices().tick(new Date());
    const [overdue] = await mailsTo(DEMO.buyer, overdueSubject);
    expect(overdue.text).toContain('by 2026-01-05');
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailsTo(DEMO.buyer, overdueSubject, 2)).toHaveLength(1);

    await t.http.post(`/api/corrective-actions/${car.body.id}/send`).set(buyer).send({});
    const [link] = await mailsTo('quality@hazelmere.example', /corrective action requested/);
    const token = /\/supplier\/([A-Za-z0-9_.-]+)/.exec(link.text ?? '')![1];
    const answered = await t.http.post(`/api/supplier-portal/${token}/response`).send({
      containment: 'All reels of that batch quarantined in our warehouse.',
      rootCause: 'A strand pack of 8 AWG was loaded on the 4 AWG line.',
      correctiveAction: 'Strand count checked and signed at every reel change.',
      promisedOn: '2027-01-15',
    });
    expect(answered.status).toBe(200);
    const [answer] = await mailsTo(
      DEMO.buyer,
      new RegExp(`^Hazelmere Conductors answered ${car.body.number}`),
    );
    expect(answer.text).toContain('Root cause: A strand pack of 8 AWG');
  });

  it('tells whoever may approve a concession that waits for its second approval, once each, never its requester; their Today lists it', async () => {
    // Two more QA leads: one who wants the notice, one who switched it off.
    const made: Record<string, Record<string, string>> = {};
    for (const [email, name] of [
      ['second.qa@notice.example', 'Ottilie Brannagh'],
      ['quiet.qa@notice.example', 'Piers Halloran'],
    ]) {
      const res = await t.http
        .post('/api/users')
        .set(await auth(DEMO.admin))
        .send({ email, name, role: 'qa_lead', password: 'a-long-enough-passphrase' });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      const login = await t.http
        .post('/api/auth/login')
        .send({ email, password: 'a-long-enough-passphrase' });
      made[email] = { Authorization: `Bearer ${login.body.accessToken}` };
    }
    const second = made['second.qa@notice.example'];
    const quiet = made['quiet.qa@notice.example'];
    const off = await t.http
      .patch('/api/me/notices')
      .set(quiet)
      .send({ concessionAwaitsApproval: false });
    expect(off.status).toBe(200);

    const supplier = await fx.supplier('Kestrel Moor Wire');
    const product = await fx.product(supplier.id);
    const { lot } = await fx.lot(product.id, { nonconforming: 2 });
    const asked = await t.http
      .post(`/api/lots/${lot.id}/decisions`)
      .set(await auth(DEMO.qa))
      .send({
        outcome: 'accept_on_concession',
        reason: 'The ground conductor carries no load current; the power side is refused.',
        version: lot.version,
        concession: {
          scope: 'Ground runs of 1 m or less in the bench kits',
          quantity: 40,
          expiresOn: new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10),
        },
      });
    expect(asked.status, JSON.stringify(asked.body)).toBe(202);
    const concession = asked.body.concession;

    // Through the mail queue to the second QA lead and the admin (both may approve).
    const subject = new RegExp(`^Lot ${lot.id}: a concession awaits your approval`);
    const [toSecond] = await mailsTo('second.qa@notice.example', subject);
    expect(toSecond.text).toContain('Ground runs of 1 m or less in the bench kits');
    expect(toSecond.text).toContain('40 kits');
    expect(toSecond.text).toContain(`${t.config.publicUrl}/lots/${lot.id}`);
    expect(toSecond.text).toContain(`${t.config.publicUrl}/profile`);
    expect(await mailsTo(DEMO.admin, subject)).toHaveLength(1);
    // Never the requester, nobody who switched it off, nobody who may not approve.
    await new Promise((r) => setTimeout(r, 300));
    for (const nobody of [DEMO.qa, 'quiet.qa@notice.example', DEMO.buyer, DEMO.clerk]) {
      expect(await mailsTo(nobody, subject, 0), nobody).toHaveLength(0);
    }
    const stored = await em().find(
      Notice,
      { key: `concession_awaits:${concession.id}` },
      { populate: ['user'] },
    );
    expect(stored.map((n) => n.user.email).sort()).toEqual(
      [DEMO.admin, 'second.qa@notice.example'].sort(),
    );
    const messages = await em().find(OutboundMessage, {
      id: { $in: stored.map((n) => n.messageId!) },
    });
    expect(messages.map((m) => [m.relatedType, m.status])).toEqual([
      ['notice', 'sent'],
      ['notice', 'sent'],
    ]);

    // Once per user per event: the job's rounds and a second raise of the same event add none.
    await notices().tick(new Date());
    await em().transactional((tx) =>
      notices().raise(tx, {
        kind: 'concession_awaits_approval',
        key: `concession_awaits:${concession.id}`,
        subject: 'again',
        body: 'again',
        exceptUserIds: [concession.requestedBy.id],
      }),
    );
    expect(await em().count(Notice, { key: `concession_awaits:${concession.id}` })).toBe(2);
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailsTo('second.qa@notice.example', subject, 2)).toHaveLength(1);

    // Today: the approvers' list holds it; the requester's and the quiet one's lists follow
    // who may approve, not the e-mail switch; purchasing may not look.
    const awaiting = async (headers: Record<string, string>) =>
      t.http.get('/api/concessions/awaiting-approval').set(headers);
    const mine = await awaiting(second);
    expect(mine.status).toBe(200);
    expect(mine.body.items.find((c: { id: number }) => c.id === concession.id)).toMatchObject({
      status: 'pending',
      scope: 'Ground runs of 1 m or less in the bench kits',
      lot: { id: lot.id, poNumber: lot.poNumber, supplier: { name: 'Kestrel Moor Wire' } },
      requestedBy: { name: asked.body.concession.requestedBy.name },
    });
    expect((await awaiting(quiet)).body.items.map((c: { id: number }) => c.id)).toContain(
      concession.id,
    );
    expect(
      (await awaiting(await auth(DEMO.qa))).body.items.map((c: { id: number }) => c.id),
    ).not.toContain(concession.id);
    expect((await awaiting(await auth(DEMO.buyer))).status).toBe(403);

    const approved = await t.http
      .post(`/api/concessions/${concession.id}/approve`)
      .set(second)
      .send({ version: concession.version });
    expect(approved.status, JSON.stringify(approved.body)).toBe(200);
    expect((await awaiting(await auth(DEMO.admin))).body.items).toEqual([]);
  });

  it('sends one daily digest instead: not before its hour, once a day, neither doubled nor lost by a restart', async () => {
    await setChoices(DEMO.buyer, { digest: true });
    const supplier = await fx.supplier('Ivybridge Wire');
    const product = await fx.product(supplier.id);
    const first = await rejectedLot(t, fx, product.id);
    const second = await rejectedLot(t, fx, product.id);
    await new Promise((r) => setTimeout(r, 300));
    expect(
      await mailsTo(DEMO.buyer, new RegExp(`^Lot ${first.lot.id} was rejected`), 0),
    ).toHaveLength(0);
    const waiting = await em().find(Notice, { delivery: 'digest', messageId: null });
    expect(waiting.map((n) => n.key).sort()).toHaveLength(2);

    // The day after, before the digest hour: nothing; from the hour on: one digest.
    const day = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
    expect(await notices().sendDigests(new Date(`${day}T05:59:00Z`))).toBe(0);
    // A server that is killed now, before the hour, loses nothing: a fresh one sends it.
    const config = t.config;
    await t.app.close();
    let app = await createApp(config);
    await app.init();
    t.app = app;
    t.http = request(app.getHttpServer());
    // (Two servers running the job at the same time: notices-two-servers.e2e-spec.ts.)
    const at = new Date(`${day}T06:00:05Z`);
    expect(await notices(app).sendDigests(at)).toBe(1);
    expect(await notices(app).sendDigests(at)).toBe(0);
    const subject = new RegExp(`^Gaugeproof daily digest, ${day}: 2 notices`);
    const [digest] = await mailsTo(DEMO.buyer, subject);
    expect(digest.text).toContain(`Lot ${first.lot.id} was rejected`);
    expect(digest.text).toContain(`Lot ${second.lot.id} was rejected`);

    // A restart later that day: the stored day says it went; no second digest.
    await app.close();
    app = await createApp(config);
    await app.init();
    t.app = app;
    t.http = request(app.getHttpServer());
    expect(await notices(app).sendDigests(new Date(`${day}T09:00:00Z`))).toBe(0);
    await notices(app).tick(new Date(`${day}T09:00:00Z`));
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailsTo(DEMO.buyer, subject, 2)).toHaveLength(1);
    const carried = await em().find(Notice, {
      key: { $like: 'lot_rejected:%' },
      delivery: 'digest',
    });
    expect(new Set(carried.map((n) => n.messageId)).size).toBe(1);
    expect(await em().count(OutboundMessage, { id: carried[0].messageId! })).toBe(1);

    // A notice after today's digest waits for tomorrow's.
    const third = await rejectedLot(t, fx, product.id);
    expect(await notices(app).sendDigests(new Date(`${day}T23:00:00Z`))).toBe(0);
    const next = new Date(Date.parse(`${day}T06:30:00Z`) + 86_400_000);
    expect(await notices(app).sendDigests(next)).toBe(1);
    const [tomorrow] = await mailsTo(DEMO.buyer, /daily digest, .*: 1 notice$/);
    expect(tomorrow.text).toContain(`Lot ${third.lot.id} was rejected`);
    await setChoices(DEMO.buyer, { digest: false });
  });
});

describe("purchasing's queue of rejected lots without a return", () => {
  it('lists rejected lots on no return (a draft counts as one), oldest rejection first; purchasing and admin only', async () => {
    const supplier = await fx.supplier('Juniper Hollow Cable');
    const product = await fx.product(supplier.id);
    const first = await rejectedLot(t, fx, product.id);
    const second = await rejectedLot(t, fx, product.id);
    const buyer = await auth(DEMO.buyer);
    const ids = async () =>
      ((await t.http.get('/api/returns/unreturned-lots').set(buyer)).body.items as { id: number }[])
        .map((l) => l.id)
        .filter((id) => id === first.lot.id || id === second.lot.id);
    const listed = await t.http.get('/api/returns/unreturned-lots').set(buyer);
    expect(listed.status).toBe(200);
    expect(listed.body.items.find((l: { id: number }) => l.id === first.lot.id)).toMatchObject({
      poNumber: first.lot.poNumber,
      supplier: { name: 'Juniper Hollow Cable' },
      rejectedAt: expect.any(String),
    });
    expect(await ids()).toEqual([first.lot.id, second.lot.id]);
    const draft = await t.http
      .post('/api/returns')
      .set(buyer)
      .send({ lotIds: [first.lot.id] });
    expect(draft.status).toBe(201);
    expect(await ids()).toEqual([second.lot.id]);
    const cancelled = await t.http
      .post(`/api/returns/${draft.body.id}/cancel`)
      .set(buyer)
      .send({ reason: 'Raised on the wrong supplier account', version: draft.body.version });
    expect(cancelled.status, JSON.stringify(cancelled.body)).toBe(200);
    expect(await ids()).toEqual([first.lot.id, second.lot.id]);
    expect((await t.http.get('/api/returns/unreturned-lots').set(await auth(DEMO.qa))).status).toBe(
      403,
    );
  });
});
