import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../src/seed/seed-users';
import { ChildServer, freePort } from './helpers/child-server';

/**
 * Nothing seeded unless asked (issue 17 item 5): the production server, started without
 * SEED_DEMO, creates no demo accounts; started on a database that has them, it warns at
 * every start.
 */
const dir = mkdtempSync(join(tmpdir(), 'gp-seed-default-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function server(db: string, env: Record<string, string> = {}) {
  const s = new ChildServer(await freePort(), {
    DB_PATH: join(dir, db),
    UPLOAD_DIR: join(dir, `${db}-uploads`),
    JWT_SECRET: 'test-secret-that-is-long-enough',
    SEED_DEMO: '',
    ...env,
  });
  await s.start();
  return s;
}
const signIn = (s: ChildServer, email: string) =>
  fetch(`${s.url}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });

describe('demo data only when asked', () => {
  it('starts a new database empty when SEED_DEMO is not set: no demo admin', async () => {
    const s = await server('plain.sqlite');
    try {
      expect((await signIn(s, 'admin@demo.example')).status).toBe(401);
      expect(s.output).not.toContain('Demo accounts are active');
    } finally {
      await s.kill('SIGTERM');
    }
  }, 90_000);

  it('warns at every start while demo accounts are open, and not once they are closed', async () => {
    const seeded = await server('demo.sqlite', { SEED_DEMO: 'catalog' });
    expect((await signIn(seeded, 'admin@demo.example')).status).toBe(200);
    await seeded.kill('SIGTERM');
    for (let start = 0; start < 2; start++) {
      const s = await server('demo.sqlite');
      try {
        expect(s.output).toContain('Demo accounts are active with the published demo password');
        expect(s.output).toContain('admin@demo.example');
      } finally {
        await s.kill('SIGTERM');
      }
    }
    // The admin gives every demo account a new password (the first three) or deactivates it.
    const s = await server('demo.sqlite');
    try {
      const token = (await (await signIn(s, 'admin@demo.example')).json()) as {
        accessToken: string;
      };
      const users = (await (
        await fetch(`${s.url}/api/users`, {
          headers: { Authorization: `Bearer ${token.accessToken}` },
        })
      ).json()) as { id: number; email: string; version: number }[];
      const others = users.filter((u) => u.email !== 'admin@demo.example');
      for (const u of others) {
        const res = await fetch(`${s.url}/api/users/${u.id}`, {
          method: 'PATCH',
          headers: {
            Authorization: `Bearer ${token.accessToken}`,
            'content-type': 'application/json',
          },
          body: JSON.stringify({ password: `a-new-password-${u.id}`, version: u.version }),
        });
        expect(res.status).toBe(200);
      }
      const self = users.find((u) => u.email === 'admin@demo.example')!;
      const res = await fetch(`${s.url}/api/users/${self.id}`, {
        method: 'PATCH',
        headers: {
          Authorization: `Bearer ${token.accessToken}`,
          'content-type': 'application/json',
        },
        body: JSON.stringify({ password: 'the-admins-own-password', version: self.version }),
      });
      expect(res.status).toBe(200);
    } finally {
      await s.kill('SIGTERM');
    }
    const after = await server('demo.sqlite');
    try {
      expect(after.output).not.toContain('Demo accounts are active');
    } finally {
      await after.kill('SIGTERM');
    }
  }, 180_000);
});
