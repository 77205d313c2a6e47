import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { plainSql } from './plain-sql';

/**
 * The tables whose writes the database counts in `change_counters`: every table a cached
 * answer is read from. Each has triggers that raise its counter in the same transaction as
 * the write (on SQLite after every row, on PostgreSQL once per transaction at its commit),
 * whatever writes it: a MikroORM flush, plain SQL, another server, a script. Caches key
 * their answers by these counters (common/counted-cache.ts), so no code path announces a
 * write. A cache may read only tables listed here; a table added here needs a migration
 * for each driver creating its counter row and triggers (as Migration20261203180000 does),
 * or the server refuses to start (`checkCountedTables`).
 */
export const COUNTED_TABLES = [
  'conductor_specs',
  'corrective_actions',
  'lots',
  'products',
  'readings',
  'samples',
  'suppliers',
  'users',
  'vendor_returns',
] as const;
export type CountedTable = (typeof COUNTED_TABLES)[number];

/**
 * The counters of some tables at one moment, as one number: their sum. Counters only rise,
 * so of two readings of the same tables the later one's sum is larger exactly when one of
 * them was written in between.
 */
export type Generation = number;

/** The counters as read at one moment, for every counted table. */
export class Counters {
  constructor(private readonly versions: ReadonlyMap<string, number>) {}

  /** The generation of these tables' data. */
  of(tables: readonly CountedTable[]): Generation {
    let sum = 0;
    for (const t of tables) sum += this.versions.get(t) ?? 0;
    return sum;
  }
}

/** Reads the database's change counters: one small query. */
@Injectable()
export class ChangeCounters {
  constructor(private readonly em: EntityManager) {}

  /**
   * The counters now. Read by every request that may be answered from a cache, after it
   * arrived (never shared with a read that started earlier), so a write committed by any
   * server before the request shows in its answer.
   */
  async read(): Promise<Counters> {
    const rows = await plainSql<{ t: string; v: unknown }[]>(
      this.em,
      'select table_name as t, version as v from change_counters',
    );
    return new Counters(new Map(rows.map((r) => [r.t, Number(r.v)])));
  }
}

/**
 * Refuses to start when a counted table has no counter or lost its triggers (a SQLite
 * migration that rebuilds a table drops the table's triggers with it: such a migration
 * must create them again). Run after the migrations.
 */
export async function checkCountedTables(em: EntityManager, postgres: boolean): Promise<void> {
  const counters = await plainSql<{ t: string }[]>(
    em,
    'select table_name as t from change_counters',
  );
  const triggers = await plainSql<{ t: string; n: unknown }[]>(
    em,
    postgres
      ? `select c.relname as t, count(*) as n from pg_trigger g join pg_class c on c.oid = g.tgrelid
          where not g.tgisinternal and g.tgname like '%\\_changes\\_%' escape '\\' group by c.relname`
      : `select tbl_name as t, count(*) as n from sqlite_master
          where type = 'trigger' and name like '%\\_changes\\_%' escape '\\' group by tbl_name`,
  );
  const have = new Set(counters.map((r) => r.t));
  // Three on SQLite (insert, update, delete); two on PostgreSQL (noted, counted).
  const want = postgres ? 2 : 3;
  const triggered = new Map(triggers.map((r) => [r.t, Number(r.n)]));
  const missing = COUNTED_TABLES.filter((t) => !have.has(t) || (triggered.get(t) ?? 0) < want);
  if (missing.length > 0) {
    throw new Error(
      `Change counters missing for ${missing.join(', ')}: add a migration creating their counter rows and triggers (see common/change-counters.ts)`,
    );
  }
}
