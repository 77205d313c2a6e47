import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../src/seed/seed-users';
import { ChildServer, freePort } from './helpers/child-server';
import { DEMO } from './helpers/test-app';

/**
 * Two production servers on one SQLite file (issue 17 item 7): transactions that read and
 * then write, sent to both at once, wait for each other instead of failing with
 * SQLITE_BUSY (a 500 before transactions began IMMEDIATE).
 */
const dir = mkdtempSync(join(tmpdir(), 'gp-two-servers-'));
const env = {
  DB_PATH: join(dir, 'shared.sqlite'),
  UPLOAD_DIR: join(dir, 'uploads'),
  JWT_SECRET: 'test-secret-that-is-long-enough',
};
let a: ChildServer;
let b: ChildServer;
beforeAll(async () => {
  a = new ChildServer(await freePort(), { ...env, SEED_DEMO: 'catalog' });
  await a.start();
  b = new ChildServer(await freePort(), env);
  await b.start();
}, 120_000);
afterAll(async () => {
  await a?.kill('SIGTERM');
  await b?.kill('SIGTERM');
  rmSync(dir, { recursive: true, force: true });
});

async function api(s: ChildServer, method: string, path: string, token?: string, body?: unknown) {
  const res = await fetch(`${s.url}${path}`, {
    method,
    headers: {
      'content-type': 'application/json',
      ...(token ? { Authorization: `Bearer ${token}` } : {}),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return {
    status: res.status,
    body: (await res.json().catch(() => null)) as Record<string, unknown>,
  };
}

describe('two servers on one SQLite file', () => {
  it('answers simultaneous read-then-write transactions on both without a 5xx', async () => {
    const login = async (s: ChildServer) =>
      (
        await api(s, 'POST', '/api/auth/login', undefined, {
          email: DEMO.qa,
          password: DEMO_PASSWORD,
        })
      ).body.accessToken as string;
    const [ta, tb] = [await login(a), await login(b)];
    const products = await api(a, 'GET', '/api/products?pageSize=1', ta);
    const { id, version } = (products.body.items as { id: number; version: number }[])[0];
    // Forty edits of one loaded copy, half through each server: one is saved, the other
    // thirty-nine are told someone saved first and get the product as it is now.
    const results = await Promise.all(
      Array.from({ length: 40 }, (_, i) =>
        api(i % 2 ? b : a, 'PATCH', `/api/products/${id}`, i % 2 ? tb : ta, {
          version,
          description: `Edited by request ${i}`,
        }),
      ),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s >= 500)).toEqual([]);
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(39);
    const winner = results.find((r) => r.status === 200)!.body;
    expect(winner.version).toBe(version + 1);
    for (const lost of results.filter((r) => r.status === 409)) {
      expect(lost.body.current).toMatchObject({
        description: winner.description,
        version: version + 1,
      });
    }
    const final = await api(b, 'GET', `/api/products/${id}`, tb);
    expect(final.body).toMatchObject({ description: winner.description, version: version + 1 });
  }, 120_000);
});
