import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auth } from './helpers/api';
import { Fixtures, rejectedLot } from './helpers/decision-fixtures';
import { freePort, startMailDev, type MailDev } from './helpers/maildev';
import { DEMO, ORIGIN, startTestApp, type TestApp } from './helpers/test-app';

async function draftReturn(
  t: TestApp,
  supplierName: string,
  contactEmail: string | null = 'rma@pinecrest.example',
) {
  const fx = new Fixtures(t);
  const supplier = await fx.supplier(supplierName, contactEmail as string);
  const product = await fx.product(supplier.id);
  const { lot } = await rejectedLot(t, fx, product.id);
  const res = await t.http
    .post('/api/returns')
    .set(auth(await t.token(DEMO.buyer)))
    .send({ lotIds: [lot.id], costs: { freight: 20 } });
  expect(res.status).toBe(201);
  return { ret: res.body as { id: number; number: string }, lot };
}

/** The e-mails to suppliers (not the staff notices the rejections raise), waiting for `n`. */
async function waitForEmails(mail: MailDev, n: number) {
  for (let i = 0; i < 50; i++) {
    const emails = (await mail.emails()).filter((e) => e.subject.startsWith('Return '));
    if (emails.length >= n) return emails;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`MailDev holds fewer than ${n} e-mails`);
}

describe('e-mail through a real MailDev', () => {
  let mail: MailDev;
  let t: TestApp;
  beforeAll(async () => {
    mail = await startMailDev();
    t = await startTestApp({ SMTP_URL: mail.smtpUrl });
  });
  afterAll(async () => {
    await t.close();
    await mail.stop();
  });

  it("sends the supplier's contact a notice with the CSV and the evidence pack attached", async () => {
    const { ret, lot } = await draftReturn(t, 'Pinecrest Cable Supply');
    const res = await t.http
      .post(`/api/returns/${ret.id}/email`)
      .set(auth(await t.token(DEMO.buyer)))
      .send({ message: 'Please collect the spools by Friday.' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      status: 'sent',
      to: 'rma@pinecrest.example',
      attempts: 1,
      error: null,
    });
    expect(res.body.attachments.map((a: { filename: string }) => a.filename)).toEqual([
      `${ret.number}-readings.csv`,
      `${ret.number}-evidence.pdf`,
    ]);
    const [email] = await waitForEmails(mail, 1);
    expect(email.subject).toBe(`Return ${ret.number}: rejected cable from Pinecrest Cable Supply`);
    expect(email.to[0].address).toBe('rma@pinecrest.example');
    expect(email.text).toMatch(/^Please collect the spools by Friday\./);
    expect(email.text).toContain('Chargeback for inspection and handling: USD 20.00'); // CURRENCY unset: USD
    const names = (email.attachments ?? []).map((a) => a.generatedFileName ?? a.fileName ?? '');
    expect(names).toHaveLength(2);
    const csv = (
      await mail.attachment(
        email.id,
        names.find((n) => n.endsWith('.csv'))!,
      )
    ).toString('utf8');
    const rows = Papa.parse<string[]>(csv.replace(/^\ufeff/, '').trim(), { newline: '\r\n' }).data;
    expect(rows[0].slice(0, 6)).toEqual([
      'Reading',
      'Lot',
      'Supplier lot code',
      'PO',
      'Packing slip',
      'RTV',
    ]);
    expect(rows[1][1]).toBe(String(lot.id));
    expect(rows[1][3]).toBe(lot.poNumber);
    expect(rows[1][5]).toBe(ret.number);
    const pdf = await mail.attachment(
      email.id,
      names.find((n) => n.endsWith('.pdf'))!,
    );
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    // The pack says the notice went out, not "draft": the return is marked before it is built.
    const file = join(t.dir, 'mailed-evidence.pdf');
    writeFileSync(file, pdf);
    const text = execFileSync('pdftotext', [file, '-']).toString().replace(/\s+/g, ' ');
    expect(text).toMatch(/Status: Notice e-mailed \d{4}-\d\d-\d\d \d\d:\d\d UTC/);
    expect(text).not.toContain('Draft');
    const timeline = await t.http
      .get(`/api/lots/${lot.id}/timeline`)
      .set(auth(await t.token(DEMO.buyer)));
    const last = timeline.body.at(-1);
    expect(last).toMatchObject({
      action: 'return.email',
      after: { status: 'sent', to: 'rma@pinecrest.example' },
    });
    expect(last.summary).toMatch(
      new RegExp(`e-mailed return ${ret.number} to rma@pinecrest.example \\(sent\\)`),
    );
  });

  it('sends to the given address, and refuses when the supplier has no contact and none is given', async () => {
    const { ret } = await draftReturn(t, 'Quarry Road Wire', null);
    const buyer = await t.token(DEMO.buyer);
    const none = await t.http.post(`/api/returns/${ret.id}/email`).set(auth(buyer)).send({});
    expect(none.status).toBe(422);
    expect(none.body.message).toMatch(/has no contact e-mail/);
    const bad = await t.http
      .post(`/api/returns/${ret.id}/email`)
      .set(auth(buyer))
      .send({ to: 'not an address' });
    expect(bad.status).toBe(400);
    const given = await t.http
      .post(`/api/returns/${ret.id}/email`)
      .set(auth(buyer))
      .send({ to: 'desk@quarry-road.example' });
    expect(given.body).toMatchObject({ status: 'sent', to: 'desk@quarry-road.example' });
  });
});

describe('a send that fails', () => {
  let t: TestApp;
  let mail: MailDev | null = null;
  let port: number;
  beforeAll(async () => {
    port = await freePort(); // nothing listens here until MailDev is started below
    t = await startTestApp({ SMTP_URL: `smtp://127.0.0.1:${port}` });
  });
  afterAll(async () => {
    await t.close();
    await mail?.stop();
  });

  it('is stored as failed with the error, listed, and sent on retry with its attachments rebuilt', async () => {
    const { ret } = await draftReturn(t, 'Ember Valley Cable');
    const buyer = await t.token(DEMO.buyer);
    const res = await t.http.post(`/api/returns/${ret.id}/email`).set(auth(buyer)).send({});
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: 'failed', attempts: 1, sentAt: null });
    expect(res.body.error).toMatch(/ECONNREFUSED|connect/i);
    const failed = await t.http.get('/api/messages?status=failed').set(auth(buyer));
    expect(failed.status).toBe(200);
    expect(failed.body.items.map((m: { id: number }) => m.id)).toContain(res.body.id);

    mail = await startMailDev(port);
    const retried = await t.http
      .post(`/api/messages/${res.body.id}/retry`)
      .set(auth(buyer))
      .set('Origin', ORIGIN);
    expect(retried.status).toBe(200);
    expect(retried.body).toMatchObject({
      id: res.body.id,
      status: 'sent',
      attempts: 2,
      error: null,
    });
    const [email] = await waitForEmails(mail, 1);
    expect(email.subject).toBe(`Return ${ret.number}: rejected cable from Ember Valley Cable`);
    expect((email.attachments ?? []).map((a) => a.contentType).sort()).toEqual([
      'application/pdf',
      'text/csv',
    ]);
    const again = await t.http.post(`/api/messages/${res.body.id}/retry`).set(auth(buyer));
    expect(again.status).toBe(422);
    const admin = await t.token(DEMO.admin);
    const audit = await t.http.get('/api/audit?action=message.retry').set(auth(admin));
    expect(audit.body.items[0]).toMatchObject({
      before: { status: 'failed' },
      after: { status: 'sent' },
    });
  });
});

describe('without SMTP_URL', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ SMTP_URL: '' });
  });
  afterAll(async () => t.close());

  it('stores the message as logged, not sent', async () => {
    const { ret } = await draftReturn(t, 'Silverline Harness Co');
    const res = await t.http
      .post(`/api/returns/${ret.id}/email`)
      .set(auth(await t.token(DEMO.buyer)))
      .send({});
    expect(res.body).toMatchObject({ status: 'logged', sentAt: null });
    expect(res.body.error).toMatch(/No SMTP server is set/);
  });

  it('keeps messages to purchasing and admin', async () => {
    for (const email of [DEMO.clerk, DEMO.qa]) {
      const token = await t.token(email);
      expect((await t.http.get('/api/messages').set(auth(token))).status).toBe(403);
      expect((await t.http.post('/api/messages/1/retry').set(auth(token))).status).toBe(403);
    }
    expect((await t.http.get('/api/messages').set(auth(await t.token(DEMO.admin)))).status).toBe(
      200,
    );
    expect(
      (await t.http.post('/api/messages/99999/retry').set(auth(await t.token(DEMO.buyer)))).status,
    ).toBe(404);
  });
});
