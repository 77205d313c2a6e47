import { MikroORM } from '@mikro-orm/core';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { sqliteOptions } from '../src/database/sqlite.config';

const dir = mkdtempSync(join(tmpdir(), 'gp-mig-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/**
 * Tables and indexes as SQLite stores them, without the migrator's own table. Triggers (the
 * change counters') are not described by entities; the server checks them at start.
 */
async function schemaOf(orm: MikroORM) {
  const rows = await orm.em
    .fork()
    .getConnection()
    .execute<{ type: string; name: string; sql: string }[]>(
      "select type, name, sql from sqlite_master where type in ('table', 'index') and name not like 'sqlite_%' and name not like 'mikro_orm_migrations%' order by type, name",
    );
  return rows.map((r: { type: string; name: string; sql: string }) => ({
    ...r,
    sql: (r.sql ?? '').replace(/\s+/g, ' '),
  }));
}

// MikroORM's SQLite diff reports check constraints as changed even when they are equal, so
// the SQLite check compares the stored schema of "migrations applied" with "schema created
// from the entities". The PostgreSQL pass (migrations-postgres.pg-spec.ts) uses the diff.
describe('SQLite migrations', () => {
  it('build exactly the schema the entities describe', async () => {
    const migrated = await MikroORM.init(sqliteOptions(join(dir, 'migrated.sqlite')));
    const created = await MikroORM.init(sqliteOptions(join(dir, 'created.sqlite')));
    try {
      await migrated.getMigrator().up();
      await created.getSchemaGenerator().createSchema();
      const want = await schemaOf(created);
      expect(want.length).toBeGreaterThan(20);
      expect(await schemaOf(migrated)).toEqual(want);
    } finally {
      await migrated.close(true);
      await created.close(true);
    }
  });
});

describe('SQLite migration of returns (issue 14)', () => {
  it('keeps every return, its lots and its SCAR links, "sent" becoming "shipped"', async () => {
    const orm = await MikroORM.init(sqliteOptions(join(dir, 'returns.sqlite')));
    try {
      const migrator = orm.getMigrator();
      await migrator.up({ to: 'Migration20261202004800' });
      const conn = orm.em.fork().getConnection();
      const now = Date.now();
      await conn.execute(
        `insert into users (id, email, name, password_hash, role, created_at, updated_at) values (1, 'b@x.example', 'B', 'x', 'purchasing', ${now}, ${now})`,
      );
      await conn.execute(
        `insert into suppliers (id, code, name, status, created_at, updated_at) values (1, 'S1', 'Supplier one', 'approved', ${now}, ${now})`,
      );
      await conn.execute(
        `insert into vendor_returns (id, number, supplier_id, status, costs, chargeback_total, created_by_id, created_at, updated_at) values (1, 'RTV-2026-0001', 1, 'sent', '{}', 12.5, 1, ${now}, ${now}), (2, 'RTV-2026-0002', 1, 'closed', '{}', 3, 1, ${now}, ${now})`,
      );
      await conn.execute(
        `insert into products (id, supplier_id, sku, kind, description, created_at, updated_at) values (1, 1, 'SKU-1', 'spool', 'Hook-up wire', ${now}, ${now})`,
      );
      for (const id of [7, 8]) {
        await conn.execute(
          `insert into lots (id, product_id, supplier_id, po_number, quantity, unit, received_at, received_by_id, status, sampling_plan, created_at, updated_at) values (${id}, 1, 1, 'PO-${id}', 5, 'spool', ${now}, 1, 'returned', '{}', ${now}, ${now})`,
        );
      }
      await conn.execute(
        'insert into vendor_return_lots (vendor_return_id, lot_id) values (1, 7), (2, 8)',
      );
      await migrator.up();
      const rows = await conn.execute(
        'select id, status, currency, version, chargeback_total as total from vendor_returns order by id',
      );
      expect(rows).toEqual([
        {
          id: 1,
          status: 'shipped',
          currency: expect.stringMatching(/^[A-Z]{3}$/),
          version: 1,
          total: 12.5,
        },
        {
          id: 2,
          status: 'closed',
          currency: expect.stringMatching(/^[A-Z]{3}$/),
          version: 1,
          total: 3,
        },
      ]);
      expect(
        await conn.execute(
          'select vendor_return_id as r, lot_id as l from vendor_return_lots order by r',
        ),
      ).toEqual([
        { r: 1, l: 7 },
        { r: 2, l: 8 },
      ]);
      // Only the open return holds its lot.
      expect(
        await conn.execute('select lot_id as l, vendor_return_id as r from open_return_lots'),
      ).toEqual([{ l: 7, r: 1 }]);
    } finally {
      await orm.close(true);
    }
  });
});
