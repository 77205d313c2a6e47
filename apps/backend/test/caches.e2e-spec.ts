import { AsyncLocalStorage } from 'node:async_hooks';
import { MikroORM, RequestContext } from '@mikro-orm/core';
import type { SqlEntityManager } from '@mikro-orm/knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { plainSql } from '../src/common/plain-sql';
import { checkCountedTables, COUNTED_TABLES } from '../src/common/change-counters';
import { LotListCache } from '../src/lots/lot-list-cache';
import { LotsService } from '../src/lots/lots.service';
import { resolveRange } from '../src/scorecards/scorecard-range';
import { ScorecardsService } from '../src/scorecards/scorecards.service';
import { ScorecardCache } from '../src/scorecards/scorecard-cache';
import { call } from './helpers/api';
import { makeProduct, makeSupplier, spoolBody } from './helpers/catalog';
import { createBench, GOOD_4AWG_MASS } from './helpers/fixtures';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

/**
 * Caches right on every server (issue 16 point 4): two servers on one database (one SQLite
 * file here; one PostgreSQL database in the PostgreSQL pass, npm run test:pg). Each keeps
 * the lot list and the scorecards; a write through one shows on the other's next request,
 * because the answers are keyed by change counters the database raises in the write's own
 * transaction (common/change-counters.ts).
 */
let a: TestApp;
let b: TestApp;
let supplier: { id: number; name: string; version: number };
let product: { id: number; conductors: { id: number }[] };

beforeAll(async () => {
  a = await startTestApp();
  b = await startTestApp({
    DB_PATH: a.config.dbPath,
    ...(a.config.dbUrl ? { DB_URL: a.config.dbUrl } : {}),
  });
  supplier = await makeSupplier(a, 'CACHE-1', { name: 'Cachefixture Wire Works' });
  product = await makeProduct(a, spoolBody(supplier.id, 'CW-4'));
});
afterAll(async () => {
  await b?.close();
  await a?.close();
});

const listPath = () => `/api/lots?supplierId=${supplier.id}&pageSize=100`;
const lotList = async (t: TestApp) => {
  const res = await call(t, DEMO.qa, 'get', listPath());
  expect(res.status).toBe(200);
  return res.body as {
    total: number;
    items: {
      id: number;
      status: string;
      supplier: { name: string };
      receivedBy: { name: string };
    }[];
  };
};
/** The kept scorecard ranking (a year to today), this supplier's row. */
const scorecardRow = async (t: TestApp) => {
  const res = await call(t, DEMO.buyer, 'get', '/api/scorecards');
  expect(res.status).toBe(200);
  return (res.body.items as { supplierId: number; name: string; lotsReceived: number }[]).find(
    (r) => r.supplierId === supplier.id,
  );
};

async function newLot(t: TestApp, poNumber: string) {
  const res = await call(t, DEMO.clerk, 'post', '/api/lots', {
    productId: product.id,
    poNumber,
    quantity: 40,
    unit: 'spools',
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number };
}

describe('two servers on one database', () => {
  it("a lot created through one shows in the other's kept lot list and scorecards at once", async () => {
    await newLot(a, 'PO-CACHE-A1');
    const before = await lotList(b);
    expect(await lotList(b)).toEqual(before); // kept by b
    const rowBefore = await scorecardRow(b);
    expect(rowBefore).toBeDefined();

    const lot = await newLot(a, 'PO-CACHE-A2');
    const after = await lotList(b);
    expect(after.total).toBe(before.total + 1);
    expect(after.items[0]).toMatchObject({ id: lot.id, status: 'on_hold' });
    expect((await scorecardRow(b))!.lotsReceived).toBe(rowBefore!.lotsReceived + 1);
  });

  it("a supplier renamed through one shows in the other's lot list and scorecards at once", async () => {
    expect((await lotList(b)).items[0].supplier.name).toBe('Cachefixture Wire Works');
    expect((await scorecardRow(b))!.name).toBe('Cachefixture Wire Works');
    const renamed = await call(a, DEMO.buyer, 'patch', `/api/suppliers/${supplier.id}`, {
      version: supplier.version,
      name: 'Cachefixture Cable Works',
    });
    expect(renamed.status, JSON.stringify(renamed.body)).toBe(200);
    supplier = renamed.body;
    expect((await lotList(b)).items[0].supplier.name).toBe('Cachefixture Cable Works');
    expect((await scorecardRow(b))!.name).toBe('Cachefixture Cable Works');
    // The text filter matches the new name on the other server too (its kept totals).
    const found = await call(b, DEMO.qa, 'get', '/api/lots?q=cable%20works');
    expect(found.body.total).toBe((await lotList(a)).total);
  });

  it("a reading written with plain SQL through one shows in the other's lot list at once", async () => {
    const lot = await newLot(a, 'PO-CACHE-A3');
    expect((await lotList(b)).items[0]).toMatchObject({ id: lot.id, status: 'on_hold' });
    const sample = await call(a, DEMO.clerk, 'post', `/api/lots/${lot.id}/samples`, {
      conductorId: product.conductors[0].id,
    });
    expect(sample.status, JSON.stringify(sample.body)).toBe(201);
    const bench = await createBench(a);
    const reading = await call(a, DEMO.clerk, 'post', `/api/samples/${sample.body.id}/readings`, {
      ...GOOD_4AWG_MASS,
      instrumentIds: [bench.balance.id, bench.rule.id],
    });
    expect(reading.status, JSON.stringify(reading.body)).toBe(201);
    expect((await lotList(b)).items[0]).toMatchObject({ id: lot.id, status: 'inspecting' });
  });

  it('a user renamed and deactivated through one: the other shows the name and refuses the account at once', async () => {
    const email = 'cache.clerk@shop.example';
    const created = await call(a, DEMO.admin, 'post', '/api/users', {
      email,
      name: 'Cachefixture Clerk',
      role: 'clerk',
      password: 'first-password-9',
    });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const login = await b.http
      .post('/api/auth/login')
      .send({ email, password: 'first-password-9' });
    expect(login.status).toBe(200);
    const onB = { Authorization: `Bearer ${login.body.accessToken as string}` };
    const lot = await b.http
      .post('/api/lots')
      .set(onB)
      .send({ productId: product.id, poNumber: 'PO-CACHE-B1', quantity: 40, unit: 'spools' });
    expect(lot.status, JSON.stringify(lot.body)).toBe(201);
    expect((await lotList(b)).items[0].receivedBy.name).toBe('Cachefixture Clerk');

    const patched = await call(a, DEMO.admin, 'patch', `/api/users/${created.body.id}`, {
      version: created.body.version,
      name: 'Cachefixture Receiving Clerk',
      active: false,
    });
    expect(patched.status, JSON.stringify(patched.body)).toBe(200);
    expect((await lotList(b)).items[0].receivedBy.name).toBe('Cachefixture Receiving Clerk');
    expect((await b.http.get('/api/lots').set(onB)).status).toBe(401);
  });
});

/** The tables named in the SQL text of the statements `work` runs on `t`. */
async function tablesRead(t: TestApp, work: () => Promise<unknown>): Promise<Set<string>> {
  const knex = (t.app.get(MikroORM).em as SqlEntityManager).getConnection().getKnex();
  const seen = new Set<string>();
  const mine = new AsyncLocalStorage<true>();
  const note = (q: { sql: string }) => {
    // Only the work's own statements, not a poller's running meanwhile (the mail queue).
    if (!mine.getStore()) return;
    for (const m of q.sql.matchAll(/\b(?:from|join)\s+["`]?([a-z_]+)["`]?/gi)) seen.add(m[1]);
  };
  knex.on('query', note);
  try {
    await mine.run(true, () => RequestContext.create(t.app.get(MikroORM).em, work));
  } finally {
    knex.off('query', note);
  }
  seen.delete('change_counters');
  return seen;
}

describe('what each cache is keyed by', () => {
  it('names every table its answer is read from, each one counted', async () => {
    const lists = a.app.get(LotListCache) as unknown as Record<
      'totals' | 'pages',
      { tables: string[] }
    >;
    const scorecards = a.app.get(ScorecardCache) as unknown as { cache: { tables: string[] } };
    for (const tables of [lists.totals.tables, lists.pages.tables, scorecards.cache.tables]) {
      for (const table of tables) expect(COUNTED_TABLES).toContain(table);
    }
    // Asked of the services themselves (the sign-in check reads users on every request),
    // with queries never asked before, so every part of the answer is computed.
    const lots = a.app.get(LotsService);
    const page = await tablesRead(a, () =>
      lots.listAnswer({ q: 'never-asked', status: ['accepted', 'rejected'], pageSize: 7 }),
    );
    expect(page.size).toBeGreaterThan(2);
    for (const table of page) expect(lists.pages.tables).toContain(table);
    const ranking = await tablesRead(a, () =>
      a.app.get(ScorecardsService).list(resolveRange('2025-01-01', '2025-12-31')),
    );
    expect(ranking.size).toBeGreaterThan(4);
    for (const table of ranking) expect(scorecards.cache.tables).toContain(table);
  });

  it('a server refuses to start on a database where a counted table lost its triggers', async () => {
    const em = a.app.get(MikroORM).em.fork();
    const pg = Boolean(a.config.dbUrl);
    const dropped = pg ? '"lots_changes_counted" on "lots"' : '`lots_changes_update`';
    await plainSql(em, `drop trigger ${dropped}`, [], 'run');
    try {
      // What createApp runs after the migrations.
      await expect(checkCountedTables(em, pg)).rejects.toThrow(/Change counters missing for lots/);
    } finally {
      await plainSql(
        em,
        pg
          ? 'create constraint trigger "lots_changes_counted" after insert or update or delete on "lots" deferrable initially deferred for each row execute function gp_count_changes()'
          : "create trigger `lots_changes_update` after update on `lots` begin update `change_counters` set `version` = `version` + 1 where `table_name` = 'lots'; end",
        [],
        'run',
      );
    }
    await checkCountedTables(em, pg);
  });
});
