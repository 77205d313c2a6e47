import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ChildServer, freePort } from './helpers/child-server';
import { startMailDev, type MailDev } from './helpers/maildev';

/**
 * The outbound queue survives a SIGKILL: the production server fails to reach the SMTP
 * server, is killed before its retry, and sends the message once after it restarts, with
 * the buyer as Reply-To and the sender from MAIL_FROM.
 */
const dir = mkdtempSync(join(tmpdir(), 'gp-mailq-'));
let server: ChildServer;
let mail: MailDev | null = null;
let smtpPort = 0;
let token = '';

async function api<T = Record<string, unknown>>(method: string, path: string, body?: unknown) {
  const res = await server.call<T>(method, path, token, body);
  if (res.status >= 300) throw new Error(`${method} ${path}: ${res.status} ${res.text}`);
  return res.body;
}

async function signIn(email: string) {
  token = await server.signIn(email);
}

const day = (offset: number) =>
  new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);

/** A rejected lot of 2 spools, both far too light, through the API as people would. */
async function rejectedLot(): Promise<number> {
  await signIn('admin@demo.example');
  const supplier = await api<{ id: number }>('POST', '/api/suppliers', {
    name: 'Queue Test Wire Co',
    code: 'QTW1',
    contactEmail: 'quality@queuetest.example',
  });
  const product = await api<{ id: number; conductors: { id: number }[] }>('POST', '/api/products', {
    supplierId: supplier.id,
    sku: 'QT-4-RED',
    kind: 'spool',
    description: '4 AWG power cable, red, 50 m spool',
    inspectionLevel: 'S-3',
    aql: '1.0',
    conductors: [{ purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper' }],
  });
  const balance = await api<{ id: number }>('POST', '/api/instruments', {
    kind: 'balance',
    name: 'Queue bench balance',
    serial: 'QT-BAL-1',
    resolution: 0.01,
    resolutionUnit: 'g',
    calibratedOn: day(-30),
    calibrationDueOn: day(300),
  });
  const lot = await api<{ id: number }>('POST', '/api/lots', {
    productId: product.id,
    poNumber: 'PO-QUEUE-1',
    quantity: 2,
    unit: 'spools',
  });
  for (const seq of [1, 2]) {
    const sample = await api<{ id: number }>('POST', `/api/lots/${lot.id}/samples`, {
      conductorId: product.conductors[0].id,
      seq,
    });
    // 4 AWG copper weighs about 192 g/m (ASTM B258 area × IACS density); 120 g is far short.
    await api('POST', `/api/samples/${sample.id}/readings`, {
      method: 'mass',
      massG: 120,
      lengthMm: 1000,
      instrumentIds: [balance.id],
    });
  }
  const { version } = await api<{ version: number }>('GET', `/api/lots/${lot.id}`);
  await api('POST', `/api/lots/${lot.id}/decisions`, {
    outcome: 'reject',
    reason: 'Both spools weigh far less than 4 AWG copper',
    version,
  });
  return lot.id;
}

beforeAll(async () => {
  smtpPort = await freePort(); // nothing listens here until MailDev starts
  server = new ChildServer(await freePort(), {
    DB_PATH: join(dir, 'q.sqlite'),
    UPLOAD_DIR: join(dir, 'uploads'),
    JWT_SECRET: 'mail-queue-test-secret-0123',
    SEED_DEMO: 'catalog',
    SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
    MAIL_FROM: 'Riverside Receiving <receiving@riverside-works.example>',
    MAIL_RETRY_BASE_MS: '2000',
    MAIL_QUEUE_POLL_MS: '250',
  });
  await server.start();
}, 120_000);

afterAll(async () => {
  await server?.kill();
  await mail?.stop();
  rmSync(dir, { recursive: true, force: true });
});

describe('the outbound mail queue', () => {
  it('sends a message once after a SIGKILL between a failed send and its retry', async () => {
    const lotId = await rejectedLot();
    await signIn('buyer@demo.example');
    const ret = await api<{ id: number; number: string }>('POST', '/api/returns', {
      lotIds: [lotId],
    });
    const first = await api<{
      id: number;
      status: string;
      attempts: number;
      error: string;
      nextAttemptAt: string;
      replyTo: string;
    }>('POST', `/api/returns/${ret.id}/email`, {});
    expect(first).toMatchObject({ status: 'failed', attempts: 1, replyTo: 'buyer@demo.example' });
    expect(first.error).toMatch(/ECONNREFUSED|connect/i);
    expect(Date.parse(first.nextAttemptAt)).toBeGreaterThan(Date.now()); // 2 s back-off

    await server.kill('SIGKILL'); // before the retry is due
    const inbox = await startMailDev(smtpPort);
    mail = inbox;
    await server.start();

    // The notice: the supplier's, not the staff notice the rejection raised.
    const toSupplier = async () =>
      (await inbox.emails()).filter((e) => e.subject.startsWith('Return '));
    let emails = await toSupplier();
    for (let i = 0; i < 100 && emails.length === 0; i++) {
      await new Promise((r) => setTimeout(r, 100));
      emails = await toSupplier();
    }
    expect(emails).toHaveLength(1);
    // A few more polls of the queue: nothing goes twice.
    await new Promise((r) => setTimeout(r, 1500));
    emails = await toSupplier();
    expect(emails).toHaveLength(1);
    const [email] = emails as unknown as {
      source: string;
      subject: string;
      from: { address: string; name: string }[];
    }[];
    expect(email.subject).toBe(`Return ${ret.number}: rejected cable from Queue Test Wire Co`);
    expect(email.from[0]).toMatchObject({
      address: 'receiving@riverside-works.example',
      name: 'Riverside Receiving',
    });
    // MailDev's parsed view leaves Reply-To out; the raw message it keeps on disk has it.
    const raw = readFileSync(email.source, 'utf8');
    expect(raw).toMatch(/^Reply-To: buyer@demo\.example\r?$/m);
    expect(raw).toMatch(/^Message-ID: <gp-message-\d+@localhost>\r?$/im);
    const [message] = (
      await api<{ items: { id: number; status: string; attempts: number }[] }>(
        'GET',
        `/api/messages?relatedType=vendor_return&relatedId=${ret.id}`,
      )
    ).items;
    expect(message).toMatchObject({ id: first.id, status: 'sent', attempts: 2 });
  }, 120_000);
});
