import { EntityManager } from '@mikro-orm/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OutboundMessage } from '../src/mail/entities/outbound-message.entity';
import { Notice } from '../src/notices/entities/notice.entity';
import { NoticeSettings } from '../src/notices/entities/notice-settings.entity';
import { NoticesService } from '../src/notices/notices.service';
import { User } from '../src/users/entities/user.entity';
import { ChildServer, freePort } from './helpers/child-server';
import { startMailDev, type MailDev } from './helpers/maildev';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

/**
 * Two production servers on one database (the SQLite file, or PostgreSQL in the
 * `test:pg` pass), both running the notice job every 100 ms at the same time: each daily
 * digest is claimed in the database (`notice_settings.digest_sent_on`, a conditional
 * update in the transaction that queues the e-mail), so it goes out once per user, never
 * twice and never lost. The test app only prepares the state and raises the events.
 */
const USERS = 12;
let t: TestApp;
let mail: MailDev;
let a: ChildServer;
let b: ChildServer;
beforeAll(async () => {
  mail = await startMailDev();
  t = await startTestApp({ SMTP_URL: mail.smtpUrl, NOTICE_POLL_MS: '0' });
}, 120_000);
afterAll(async () => {
  await a?.kill('SIGTERM');
  await b?.kill('SIGTERM');
  await t?.close();
  await mail?.stop();
});

const buyerEmail = (i: number) => `digest.buyer.${i}@two-servers.example`;

describe('the daily digest with two servers at once', () => {
  it('goes out once per user while both servers run the job on one database', async () => {
    const admin = { Authorization: `Bearer ${await t.token(DEMO.admin)}` };
    for (let i = 0; i < USERS; i++) {
      const res = await t.http
        .post('/api/users')
        .set(admin)
        .send({
          email: buyerEmail(i),
          name: `Digest Buyer ${i}`,
          role: 'purchasing',
          password: 'a-long-enough-passphrase',
        });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
    }
    const em = t.app.get(EntityManager).fork();
    const buyers = await em.find(User, { email: { $like: '%@two-servers.example' } });
    for (const user of buyers) {
      em.create(NoticeSettings, {
        user,
        lotAwaitsDecision: false,
        lotRejectNumber: false,
        lotRejected: true,
        scarOverdue: true,
        scarAnswered: true,
        concessionAwaitsApproval: false,
        digest: true,
      });
    }
    await em.flush();

    // Both servers up, each polling every 100 ms; the digest hour (0 UTC) has passed.
    const env = {
      ...(t.config.dbUrl ? { DB_URL: t.config.dbUrl } : { DB_PATH: t.config.dbPath }),
      UPLOAD_DIR: t.config.uploadDir,
      JWT_SECRET: 'test-secret-that-is-long-enough',
      SMTP_URL: mail.smtpUrl,
      NOTICE_POLL_MS: '100',
      DIGEST_HOUR_UTC: '0',
      MAIL_RETRY_BASE_MS: '200',
    };
    a = new ChildServer(await freePort(), env);
    b = new ChildServer(await freePort(), env);
    await Promise.all([a.start(), b.start()]);

    // Two events raised in one transaction: both servers find them at the same round.
    const notices = t.app.get(NoticesService);
    await t.app
      .get(EntityManager)
      .fork()
      .transactional(async (tx) => {
        for (const n of [1, 2]) {
          await notices.raise(tx, {
            kind: 'lot_rejected',
            key: `two-servers:${n}`,
            subject: `Two-server event ${n}`,
            body: `Event ${n} for the digest.`,
            wants: (c) => c.lotRejected && c.digest,
          });
        }
      });

    const digests = async () =>
      (await mail.emails()).filter((e) =>
        /^Gaugeproof daily digest, \d{4}-\d{2}-\d{2}: 2 notices$/.test(e.subject),
      );
    for (let i = 0; i < 200 && (await digests()).length < USERS; i++) {
      await new Promise((r) => setTimeout(r, 100));
    }
    // Ten more rounds of both jobs: nothing more may go.
    await new Promise((r) => setTimeout(r, 1_000));

    const sent = await digests();
    const perUser = new Map<string, number>();
    for (const e of sent) {
      for (const to of e.to) perUser.set(to.address, (perUser.get(to.address) ?? 0) + 1);
    }
    expect([...perUser.keys()].sort()).toEqual(
      Array.from({ length: USERS }, (_, i) => buyerEmail(i)).sort(),
    );
    expect([...perUser.values()].every((n) => n === 1)).toBe(true);
    for (const e of sent) {
      expect(e.text).toContain('Two-server event 1');
      expect(e.text).toContain('Two-server event 2');
    }

    // The database agrees: one queued digest per user, every notice carried by it, sent.
    const check = t.app.get(EntityManager).fork();
    const queued = await check.find(OutboundMessage, {
      subject: { $like: 'Gaugeproof daily digest%' },
    });
    expect(queued).toHaveLength(USERS);
    expect(new Set(queued.map((m) => m.to)).size).toBe(USERS);
    expect(queued.every((m) => m.status === 'sent')).toBe(true);
    const carried = await check.find(Notice, { key: { $like: 'two-servers:%' } });
    expect(carried).toHaveLength(2 * USERS);
    expect(carried.every((n) => n.delivery === 'digest' && n.messageId !== null)).toBe(true);
    // Neither server's job stopped on the other's lock (SQLITE_BUSY or a PostgreSQL error).
    expect(a.output + b.output).not.toContain('notice job stopped');
  }, 180_000);
});
