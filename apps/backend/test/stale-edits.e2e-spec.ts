import { MikroORM } from '@mikro-orm/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { call, dayFromToday } from './helpers/api';
import { makeProduct, makeSupplier, spoolBody } from './helpers/catalog';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

// Issue 17 item 7: suppliers, products, instruments and accounts carry a version; an edit made on a
// stale copy is refused with 409 and the record as it is now, and nothing of it is saved.
// Runs on SQLite and, in `npm run test:pg`, on PostgreSQL (where simultaneous edits of one
// version race on the row's `where version = ?`).

let t: TestApp;

beforeAll(async () => {
  t = await startTestApp();
});

afterAll(async () => {
  await t.close();
});

const audits = (entityType: string, entityId: number) =>
  t.app.get(MikroORM).em.fork().count(AuditEvent, { entityType, entityId });

interface Kind {
  name: string;
  path: string;
  who: string;
  entityType: string;
  make: () => Promise<{ id: number; version: number }>;
  /** Two different edits, each a body without its version. */
  edits: [Record<string, unknown>, Record<string, unknown>];
  /** The field the edits change, to see which one was kept. */
  field: string;
  /** The record as it is now (default: GET path/id). */
  read?: (id: number) => Promise<Record<string, unknown>>;
}

const KINDS: Kind[] = [
  {
    name: 'supplier',
    path: '/api/suppliers',
    who: DEMO.buyer,
    entityType: 'supplier',
    make: () => makeSupplier(t, `STALE-${Math.random().toString(36).slice(2, 8)}`),
    edits: [{ notes: 'Phoned about the short spool' }, { notes: 'Asked for a new RMA address' }],
    field: 'notes',
  },
  {
    name: 'product',
    path: '/api/products',
    who: DEMO.qa,
    entityType: 'product',
    make: async () => {
      const s = await makeSupplier(t, `STP-${Math.random().toString(36).slice(2, 8)}`);
      return makeProduct(t, spoolBody(s.id, 'SP-STALE'));
    },
    edits: [{ description: 'Spool, red jacket' }, { description: 'Spool, black jacket' }],
    field: 'description',
  },
  {
    name: 'instrument',
    path: '/api/instruments',
    who: DEMO.qa,
    entityType: 'instrument',
    make: async () => {
      const res = await call(t, DEMO.qa, 'post', '/api/instruments', {
        kind: 'balance',
        name: 'Stale-edit balance',
        serial: `SB-${Math.random().toString(36).slice(2, 8)}`,
        resolution: 0.001,
        resolutionUnit: 'g',
        calibratedOn: dayFromToday(-30),
        calibrationDueOn: dayFromToday(300),
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body;
    },
    edits: [{ name: 'Balance by the window' }, { name: 'Balance by the door' }],
    field: 'name',
  },
  {
    name: 'account',
    path: '/api/users',
    who: DEMO.admin,
    entityType: 'user',
    make: async () => {
      const res = await call(t, DEMO.admin, 'post', '/api/users', {
        email: `stale-${Math.random().toString(36).slice(2, 8)}@shop.example`,
        name: 'Stale Edit Person',
        role: 'clerk',
        password: 'copper-spool-reel-42',
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body;
    },
    // Two admins: one changes the role, the other (on the old copy) another role.
    edits: [{ role: 'qa_lead' }, { role: 'purchasing' }],
    field: 'role',
    // Accounts are read from the list (there is no GET of one).
    read: async (id) => {
      const list = await call(t, DEMO.admin, 'get', '/api/users');
      return (list.body as { id: number }[]).find((u) => u.id === id) as Record<string, unknown>;
    },
  },
];

const current = async (kind: Kind, id: number) =>
  kind.read ? kind.read(id) : (await call(t, kind.who, 'get', `${kind.path}/${id}`)).body;

describe.each(KINDS)('an edit of a $name made on a stale copy', (kind) => {
  it('is refused with 409 and the current record; nothing of it is saved or audited', async () => {
    const made = await kind.make();
    expect(made.version).toBe(1);
    const first = await call(t, kind.who, 'patch', `${kind.path}/${made.id}`, {
      version: made.version,
      ...kind.edits[0],
    });
    expect(first.status, JSON.stringify(first.body)).toBe(200);
    expect(first.body.version).toBe(2);
    const eventsBefore = await audits(kind.entityType, made.id);

    // The second editor loaded the record before the first saved.
    const stale = await call(t, kind.who, 'patch', `${kind.path}/${made.id}`, {
      version: made.version,
      ...kind.edits[1],
    });
    expect(stale.status).toBe(409);
    expect(stale.body.message).toMatch(/^Someone else saved .* after you opened it/);
    expect(stale.body.current).toMatchObject({
      id: made.id,
      version: 2,
      [kind.field]: kind.edits[0][kind.field],
    });
    expect(await current(kind, made.id)).toMatchObject({
      version: 2,
      [kind.field]: kind.edits[0][kind.field],
    });
    expect(await audits(kind.entityType, made.id)).toBe(eventsBefore);

    // Made again on the version it was given back, the edit is saved.
    const again = await call(t, kind.who, 'patch', `${kind.path}/${made.id}`, {
      version: stale.body.current.version,
      ...kind.edits[1],
    });
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ version: 3, [kind.field]: kind.edits[1][kind.field] });
  });

  it('needs the version it was made on (400 naming the field)', async () => {
    const made = await kind.make();
    const res = await call(t, kind.who, 'patch', `${kind.path}/${made.id}`, kind.edits[0]);
    expect(res.status).toBe(400);
    expect(res.body.errors).toContainEqual({
      field: 'version',
      message: 'version must be a whole number',
    });
    const bad = await call(t, kind.who, 'patch', `${kind.path}/${made.id}`, {
      version: null,
      ...kind.edits[0],
    });
    expect(bad.status).toBe(400);
  });

  it('of two made at once on one version, saves one and answers the other 409', async () => {
    const made = await kind.make();
    const results = await Promise.all(
      Array.from({ length: 6 }, (_, i) =>
        call(t, kind.who, 'patch', `${kind.path}/${made.id}`, {
          version: made.version,
          ...kind.edits[i % 2],
        }),
      ),
    );
    const statuses = results.map((r) => r.status).sort();
    expect(statuses).toEqual([200, 409, 409, 409, 409, 409]);
    const saved = results.find((r) => r.status === 200)!.body;
    expect(await current(kind, made.id)).toMatchObject({
      version: 2,
      [kind.field]: saved[kind.field],
    });
  });
});

describe('a product edit that changes only its conductors', () => {
  it('moves the product version, so an edit on the copy before it is refused', async () => {
    const s = await makeSupplier(t, 'STALE-COND');
    const made = await makeProduct(t, spoolBody(s.id, 'SP-COND'));
    const conductors = await call(t, DEMO.qa, 'patch', `/api/products/${made.id}`, {
      version: made.version,
      conductors: [{ purpose: 'power', gauge: '6', claimedMaterial: 'copper' }],
    });
    expect(conductors.status).toBe(200);
    expect(conductors.body.version).toBe(made.version + 1);
    const stale = await call(t, DEMO.qa, 'patch', `/api/products/${made.id}`, {
      version: made.version,
      aql: '0.65',
    });
    expect(stale.status).toBe(409);
    expect(stale.body.current.conductors[0].gauge).toBe('6 AWG');
    expect(stale.body.current.aql).toBe('1.0');
  });
});
