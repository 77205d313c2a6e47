import { MikroORM } from '@mikro-orm/core';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { sqliteOptions } from '../src/database/sqlite.config';

const dir = mkdtempSync(join(tmpdir(), 'gp-mig-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Tables and indexes as SQLite stores them, without the migrator's own table. */
async function schemaOf(orm: MikroORM) {
  const rows = await orm.em
    .fork()
    .getConnection()
    .execute<{ type: string; name: string; sql: string }[]>(
      "select type, name, sql from sqlite_master where name not like 'sqlite_%' and name not like 'mikro_orm_migrations%' order by type, name",
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
