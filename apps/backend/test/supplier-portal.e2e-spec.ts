import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Jimp } from 'jimp';
import { EntityManager } from '@mikro-orm/core';
import { ReturnLink } from '../src/returns/entities/return-link.entity';
import { SupplierLink } from '../src/corrective-actions/entities/supplier-link.entity';
import {
  PortalThrottle,
  PORTAL_BAD_TOKENS_PER_WINDOW,
} from '../src/supplier-portal/portal-throttle';
import { auth, dayFromToday } from './helpers/api';
import { Fixtures, rejectedLot, startWithFixtures } from './helpers/decision-fixtures';
import { startMailDev, type MailDev } from './helpers/maildev';
import { DEMO, type TestApp } from './helpers/test-app';

let t: TestApp;
let fx: Fixtures;
let mail: MailDev;
let buyer: string;
beforeAll(async () => {
  mail = await startMailDev();
  ({ t, fx, token: buyer } = await startWithFixtures(DEMO.buyer, { SMTP_URL: mail.smtpUrl }));
});
afterAll(async () => {
  await t.close();
  await mail.stop();
});

const inDays = dayFromToday;
const ANSWER = {
  containment: 'All reels of that batch quarantined in our warehouse and at two distributors.',
  rootCause: 'A strand pack of 8 AWG was loaded on the 4 AWG line after a changeover.',
  correctiveAction: 'Strand count checked and signed at every reel change; operators trained.',
  promisedOn: inDays(20),
};

async function scarWithLink(name: string) {
  const supplier = await fx.supplier(
    name,
    `quality@${name.toLowerCase().replace(/\W+/g, '')}.example`,
  );
  const product = await fx.product(supplier.id);
  const { lot } = await rejectedLot(t, fx, product.id);
  const car = await t.http
    .post('/api/corrective-actions')
    .set(auth(buyer))
    .send({
      supplierId: supplier.id,
      lotIds: [lot.id],
      problem: '4 AWG spools measure as 8 AWG: about 40 % of the copper',
      dueOn: inDays(14),
    });
  expect(car.status).toBe(201);
  const before = (await mail.emails()).length;
  const sent = await t.http
    .post(`/api/corrective-actions/${car.body.id}/send`)
    .set(auth(buyer))
    .send({});
  expect(sent.status).toBe(201);
  expect(sent.body.message).toMatchObject({ status: 'sent', replyTo: 'buyer@demo.example' });
  let emails = await mail.emails();
  for (let i = 0; i < 50 && emails.length <= before; i++) {
    await new Promise((r) => setTimeout(r, 100));
    emails = await mail.emails();
  }
  const email = emails.find(
    (e) => e.subject === `${car.body.number}: corrective action requested`,
  )!;
  const token = /\/supplier\/([A-Za-z0-9_.-]+)/.exec(email.text ?? '')![1];
  return { supplier, lot, car: car.body as { id: number; number: string }, token, email };
}

const portal = (token: string, rest = '') => `/api/supplier-portal/${token}${rest}`;

describe('the supplier portal', () => {
  it('e-mails a link that shows one request and nothing internal, and takes the answer with files', async () => {
    const { car, token, lot, email } = await scarWithLink('Hollowbrook Conductors');
    expect(email.text).toContain(`${t.config.publicUrl}/supplier/`);
    const other = await scarWithLink('Stonegate Wire');
    const page = await t.http.get(portal(token));
    expect(page.status).toBe(200);
    expect(page.headers['cache-control']).toBe('no-store');
    expect(page.body).toMatchObject({
      number: car.number,
      status: 'open',
      supplier: { name: 'Hollowbrook Conductors' },
      canAnswer: true,
      lots: [{ poNumber: lot.poNumber }],
    });
    const text = JSON.stringify(page.body);
    for (const leak of [
      'Stonegate',
      other.car.number,
      'buyer@demo.example',
      '"id"',
      'createdBy',
      'notes',
    ])
      expect(text).not.toContain(leak);

    const bad = await t.http
      .post(portal(token, '/response'))
      .send({ ...ANSWER, rootCause: 'short' });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toEqual(['rootCause must be at least 10 characters']);
    const answered = await t.http.post(portal(token, '/response')).send(ANSWER);
    expect(answered.status).toBe(200);
    expect(answered.body).toMatchObject({ status: 'responded', canAnswer: false });
    expect((await t.http.post(portal(token, '/response')).send(ANSWER)).status).toBe(422);

    const png = await new Jimp({ width: 4, height: 4, color: 0xb87333ff }).getBuffer('image/png');
    const photo = await t.http
      .post(portal(token, '/attachments'))
      .attach('file', png, 'line photo.png');
    expect(photo.status).toBe(201);
    expect(photo.body).toMatchObject({ filename: 'line photo.png', contentType: 'image/png' });
    const pdf = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');
    expect(
      (await t.http.post(portal(token, '/attachments')).attach('file', pdf, '8D.pdf')).status,
    ).toBe(201);
    const fake = await t.http
      .post(portal(token, '/attachments'))
      .attach('file', Buffer.from('MZ not a picture'), {
        filename: 'report.pdf',
        contentType: 'application/pdf',
      });
    expect(fake.status).toBe(415);
    const big = await t.http
      .post(portal(token, '/attachments'))
      .attach(
        'file',
        Buffer.concat([Buffer.from('%PDF-'), Buffer.alloc(10 * 1024 * 1024)]),
        '8D.pdf',
      );
    expect(big.status).toBe(413);

    // Purchasing sees it arrive: responded, who and when, the files.
    const seen = await t.http.get(`/api/corrective-actions/${car.id}`).set(auth(buyer));
    expect(seen.body).toMatchObject({
      status: 'responded',
      promisedOn: ANSWER.promisedOn,
      respondedBy: expect.stringMatching(
        /^supplier link \(quality@hollowbrookconductors\.example\)$/,
      ),
      respondedAt: expect.any(String),
    });
    const files = await t.http
      .get(`/api/corrective-actions/${car.id}/attachments`)
      .set(auth(buyer));
    expect(files.body.map((f: { filename: string }) => f.filename)).toEqual([
      'line photo.png',
      '8D.pdf',
    ]);
    const audit = await t.http
      .get('/api/audit?action=corrective_action.respond')
      .set(auth(await t.token(DEMO.admin)));
    expect(audit.body.items[0]).toMatchObject({
      entityId: car.id,
      after: { via: 'supplier link', status: 'responded' },
    });
  });

  it('refuses a tampered, an unknown, an expired and a revoked link with a clear sentence', async () => {
    const { car, token } = await scarWithLink('Redfern Cable Mill');
    const [random, sig] = token.split('.');
    const flipped = `${random.slice(0, -1)}${random.endsWith('A') ? 'B' : 'A'}.${sig}`;
    for (const t2 of [flipped, `${random}.${sig.slice(0, -2)}xx`, 'nonsense', `${token}.extra`]) {
      const res = await t.http.get(portal(t2));
      expect(res.status).toBe(404);
      expect(res.body.message).toMatch(/^This link is not valid/);
    }
    const em = t.app.get(EntityManager).fork();
    await em.nativeUpdate(
      SupplierLink,
      { correctiveAction: car.id },
      { expiresAt: new Date(Date.now() - 1000) },
    );
    const expired = await t.http.get(portal(token));
    expect(expired.status).toBe(410);
    expect(expired.body.message).toMatch(/^This link expired on \d{4}-\d{2}-\d{2}/);
    expect((await t.http.post(portal(token, '/response')).send(ANSWER)).status).toBe(410);

    const fresh = await scarWithLink('Redfern Cable Mill Two');
    const revoked = await t.http
      .post(`/api/corrective-actions/${fresh.car.id}/revoke-links`)
      .set(auth(buyer));
    expect(revoked.body).toEqual({ revoked: 1 });
    const gone = await t.http.get(portal(fresh.token));
    expect(gone.status).toBe(410);
    expect(gone.body.message).toMatch(/withdrawn/);
  });

  it('reopens with a comment e-mailed to the supplier, and verifies only with evidence, recording who and when', async () => {
    const { car, token } = await scarWithLink('Ashgrove Electric Wire');
    await t.http.post(portal(token, '/response')).send(ANSWER);
    const version = (await t.http.get(`/api/corrective-actions/${car.id}`).set(auth(buyer))).body
      .version;
    const noComment = await t.http
      .patch(`/api/corrective-actions/${car.id}`)
      .set(auth(buyer))
      .send({ version, status: 'reopened' });
    expect(noComment.status).toBe(422);
    const reopened = await t.http.patch(`/api/corrective-actions/${car.id}`).set(auth(buyer)).send({
      version,
      status: 'reopened',
      comment: 'Send the signed reel-change checklist of December.',
    });
    expect(reopened.status).toBe(200);
    expect(reopened.body).toMatchObject({ status: 'reopened', mail: { status: 'sent' } });
    const emails = await mail.emails();
    const again = emails.filter((e) => e.subject === `${car.number}: corrective action requested`);
    expect(again).toHaveLength(2);
    expect(again[1].text).toContain('Send the signed reel-change checklist of December.');
    const newToken = /\/supplier\/([A-Za-z0-9_.-]+)/.exec(again[1].text ?? '')![1];
    const view = await t.http.get(portal(newToken));
    expect(view.body).toMatchObject({
      status: 'reopened',
      canAnswer: true,
      reopenComment: expect.stringContaining('checklist'),
    });
    expect((await t.http.post(portal(newToken, '/response')).send(ANSWER)).status).toBe(200);

    const v2 = (await t.http.get(`/api/corrective-actions/${car.id}`).set(auth(buyer))).body
      .version;
    const bare = await t.http
      .patch(`/api/corrective-actions/${car.id}`)
      .set(auth(await t.token(DEMO.qa)))
      .send({ version: v2, status: 'verified' });
    expect(bare.status).toBe(422);
    expect(bare.body.message).toMatch(/Give the evidence/);
    const verified = await t.http
      .patch(`/api/corrective-actions/${car.id}`)
      .set(auth(await t.token(DEMO.qa)))
      .send({
        version: v2,
        status: 'verified',
        verificationNote: 'Checklist received and checked on site.',
      });
    expect(verified.status).toBe(200);
    expect(verified.body.verification).toMatchObject({
      by: { name: expect.any(String) },
      at: expect.any(String),
      note: 'Checklist received and checked on site.',
    });
  });

  it('e-mails a return notice with a link to a page of that return only: its lots, its photos, its evidence pack', async () => {
    const supplier = await fx.supplier('Larkspur Conductors', 'quality@larkspur.example');
    const product = await fx.product(supplier.id);
    const { lot } = await rejectedLot(t, fx, product.id);
    // Another lot of the same supplier, not on the return, with a photo of its own.
    const { lot: otherLot } = await rejectedLot(t, fx, product.id);
    const png = await new Jimp({ width: 6, height: 4, color: 0xb87333ff }).getBuffer('image/png');
    const photoOf = async (lotId: number, caption: string) => {
      const res = await t.http
        .post(`/api/lots/${lotId}/photos`)
        .set(auth(await t.token(DEMO.clerk)))
        .field('caption', caption)
        .attach('file', png, { filename: 'cut.png', contentType: 'image/png' });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
    };
    await photoOf(lot.id, 'Internal: clerk thinks the reel was swapped');
    await photoOf(otherLot.id, 'Photo of the other lot');
    const ret = await t.http
      .post('/api/returns')
      .set(auth(buyer))
      .send({
        lotIds: [lot.id],
        notes: 'Internal: buyer negotiates a discount instead',
        supplierNote: 'Two of three units measure as 8 AWG, not the 4 AWG ordered.',
      });
    expect(ret.status, JSON.stringify(ret.body)).toBe(201);
    const before = (await mail.emails()).length;
    const sent = await t.http.post(`/api/returns/${ret.body.id}/email`).set(auth(buyer)).send({});
    expect(sent.status, JSON.stringify(sent.body)).toBe(201);
    expect(sent.body).toMatchObject({ status: 'sent', replyTo: 'buyer@demo.example' });
    let emails = await mail.emails();
    for (let i = 0; i < 50 && emails.length <= before; i++) {
      await new Promise((r) => setTimeout(r, 100));
      emails = await mail.emails();
    }
    const email = emails.find((e) => e.subject.startsWith(`Return ${ret.body.number}`))!;
    expect(email.text).toContain('Why: Two of three units measure as 8 AWG');
    expect(email.text).not.toContain('Internal');
    const token = /\/supplier\/([A-Za-z0-9_.-]+)/.exec(email.text ?? '')![1];

    const page = await t.http.get(portal(token));
    expect(page.status).toBe(200);
    expect(page.headers['cache-control']).toBe('no-store');
    expect(page.body).toMatchObject({
      kind: 'return',
      number: ret.body.number,
      status: 'emailed',
      supplier: { name: 'Larkspur Conductors' },
      note: 'Two of three units measure as 8 AWG, not the 4 AWG ordered.',
      lots: [{ poNumber: lot.poNumber }],
      photos: [{ n: 1, poNumber: lot.poNumber, width: 6, height: 4 }],
      evidencePack: { number: ret.body.number },
    });
    const text = JSON.stringify(page.body);
    for (const leak of [
      'Internal',
      otherLot.poNumber,
      'buyer@demo.example',
      'clerk@demo.example',
      '"id"',
      'createdBy',
      'notes',
      'reason',
    ])
      expect(text).not.toContain(leak);

    const photo = await t.http.get(portal(token, '/photos/1'));
    expect(photo.status).toBe(200);
    expect(photo.headers['content-type']).toBe('image/png');
    expect(photo.body.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a'); // PNG signature
    const thumb = await t.http.get(portal(token, '/photos/1?size=thumbnail'));
    expect(thumb.status).toBe(200);
    // The other lot's photo is not reachable from this page, by any number.
    expect((await t.http.get(portal(token, '/photos/2'))).status).toBe(404);
    const pdf = await t.http.get(portal(token, '/evidence.pdf'));
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');

    // A notice takes no answer and no files; a SCAR link shows no photos.
    const answer = await t.http.post(portal(token, '/response')).send(ANSWER);
    expect(answer.status).toBe(422);
    expect(answer.body.message).toMatch(/return notice; it takes no answer/);
    const file = await t.http.post(portal(token, '/attachments')).attach('file', png, 'x.png');
    expect(file.status).toBe(422);
    const scar = await scarWithLink('Larkspur Cable Two');
    expect((await t.http.get(portal(scar.token, '/photos/1'))).status).toBe(404);

    // Expired and revoked like a SCAR's link.
    const em = t.app.get(EntityManager).fork();
    await em.nativeUpdate(
      ReturnLink,
      { vendorReturn: ret.body.id },
      { expiresAt: new Date(Date.now() - 1000) },
    );
    expect((await t.http.get(portal(token))).status).toBe(410);
    expect((await t.http.get(portal(token, '/photos/1'))).status).toBe(410);
    await em.nativeUpdate(
      ReturnLink,
      { vendorReturn: ret.body.id },
      { expiresAt: new Date(Date.now() + 86_400_000) },
    );
    expect((await t.http.get(portal(token))).status).toBe(200);
    const revoked = await t.http.post(`/api/returns/${ret.body.id}/revoke-links`).set(auth(buyer));
    expect(revoked.body).toEqual({ revoked: 1 });
    const gone = await t.http.get(portal(token));
    expect(gone.status).toBe(410);
    expect(gone.body.message).toMatch(/withdrawn/);
    const stored = await em.find(ReturnLink, { vendorReturn: ret.body.id });
    expect(stored.map((l) => l.tokenHash)).not.toContain(token);
  });

  it('slows token guessing: after a few unknown tokens from one address, that address is refused for ten minutes', async () => {
    const throttle = t.app.get(PortalThrottle);
    throttle.reset();
    const { token } = await scarWithLink('Quarry Lane Wire');
    for (let i = 0; i < PORTAL_BAD_TOKENS_PER_WINDOW; i++) {
      const guess = await t.http.get(portal(`guess${i}.AAAA`));
      expect(guess.status).toBe(404);
    }
    const refused = await t.http.get(portal(`guess-more.AAAA`));
    expect(refused.status).toBe(429);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(500);
    expect(refused.body.message).toMatch(/Too many links that are not valid/);
    // The real link from that address waits too; staff routes are not limited by it.
    expect((await t.http.get(portal(token))).status).toBe(429);
    expect((await t.http.get('/api/returns').set(auth(buyer))).status).toBe(200);
    throttle.reset();
    expect((await t.http.get(portal(token))).status).toBe(200);
  });
});
