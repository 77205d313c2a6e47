import { EntityManager, MikroORM } from '@mikro-orm/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { GroupCommit } from '../src/common/group-commit';
import { plainSql } from '../src/common/plain-sql';
import { Reading } from '../src/inspection/entities/reading.entity';
import {
  as,
  createBench,
  createLot,
  createProduct,
  GOOD_4AWG_MASS,
  lotRow,
  type Bench,
  type Catalog,
} from './helpers/fixtures';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
let bench: Bench;
let spool: Catalog;
beforeAll(async () => {
  t = await startTestApp();
  bench = await createBench(t);
  spool = await createProduct(t);
});
afterAll(async () => t.close());

const em = () => t.app.get(MikroORM).em.fork();

/** An audit row of our own, so each write is easy to find again. */
const mark = (tx: EntityManager, action: string) =>
  plainSql(
    tx,
    `insert into audit_events (actor_email, action, entity_type, at) values (?, ?, ?, ?)`,
    ['system', action, 'test', new Date()],
    'run',
  );
const marks = async (prefix: string) =>
  (
    await em().find(AuditEvent, { action: { $like: `${prefix}%` } }, { orderBy: { id: 'asc' } })
  ).map((e) => e.action);

describe('GroupCommit', () => {
  it('answers each write with its own result or error; a failed one leaves nothing', async () => {
    const commits = new GroupCommit(t.app.get(EntityManager));
    const results = await Promise.allSettled([
      commits.run(async (tx) => {
        await mark(tx, 'group.a');
        return 'a';
      }),
      commits.run(async (tx) => {
        await mark(tx, 'group.b');
        throw new Error('b fails after writing');
      }),
      commits.run(async (tx) => {
        // Runs after a and b in the same transaction: sees a, not b.
        const seen = await plainSql<{ n: number }[]>(
          tx,
          `select count(*) as n from audit_events where action in ('group.a', 'group.b')`,
        );
        await mark(tx, 'group.c');
        return Number(seen[0].n);
      }),
    ]);
    expect(results).toEqual([
      { status: 'fulfilled', value: 'a' },
      { status: 'rejected', reason: new Error('b fails after writing') },
      { status: 'fulfilled', value: 1 },
    ]);
    expect(await marks('group.')).toEqual(['group.a', 'group.c']);
  });

  it('rolls back a lone write that fails', async () => {
    const commits = new GroupCommit(t.app.get(EntityManager));
    await expect(
      commits.run(async (tx) => {
        await mark(tx, 'lone.x');
        throw new Error('lone fails');
      }),
    ).rejects.toThrow('lone fails');
    expect(await marks('lone.')).toEqual([]);
  });
});

describe('readings posted at the same moment', () => {
  it('are all written, each with its lot status, and a refused one among them stores nothing', async () => {
    const lots = await Promise.all([1, 2, 3, 4, 5].map(() => createLot(t, spool)));
    const samples = [];
    for (const lotId of lots) {
      const res = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, {
        conductorId: spool.conductorIds[0],
      });
      samples.push(res.body.id as number);
    }
    const before = await em().count(Reading);
    const good = { ...GOOD_4AWG_MASS, instrumentIds: [bench.balance.id, bench.rule.id] };
    const responses = await Promise.all([
      ...samples.map((id) => as(t, DEMO.clerk, 'post', `/api/samples/${id}/readings`, good)),
      as(t, DEMO.clerk, 'post', `/api/samples/${samples[0]}/readings`, {
        ...GOOD_4AWG_MASS,
        instrumentIds: [bench.overdueBalance.id],
      }),
    ]);
    expect(responses.map((r) => r.status)).toEqual([201, 201, 201, 201, 201, 422]);
    expect(await em().count(Reading)).toBe(before + 5);
    for (const lotId of lots) expect((await lotRow(t, lotId)).status).toBe('inspecting');
  });
});
