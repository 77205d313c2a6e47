import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Jimp } from 'jimp';
import { EntityManager } from '@mikro-orm/core';
import { SupplierLink } from '../src/supplier-portal/entities/supplier-link.entity';
import { Fixtures, rejectedLot } from './helpers/decision-fixtures';
import { startMailDev, type MailDev } from './helpers/maildev';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
let fx: Fixtures;
let mail: MailDev;
let buyer: string;
beforeAll(async () => {
  mail = await startMailDev();
  t = await startTestApp({ SMTP_URL: mail.smtpUrl });
  fx = new Fixtures(t);
  buyer = await t.token(DEMO.buyer);
});
afterAll(async () => {
  await t.close();
  await mail.stop();
});

const auth = (token: string) => ({ Authorization: `Bearer ${token}` });
const inDays = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10);
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
});
