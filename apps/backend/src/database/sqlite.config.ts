import { defineConfig as defineSqlite } from '@mikro-orm/better-sqlite';
import { Migrator } from '@mikro-orm/migrations';
import { ReflectMetadataProvider, type Options } from '@mikro-orm/core';
import { dirname } from 'node:path';
import { mkdirSync } from 'node:fs';
import { ENTITIES } from './entities';
import { placeInheritedColumns } from '../common/base-entities';
import { SQLITE_MIGRATIONS } from '../migrations';

/** The part of a better-sqlite3 database the pool's set-up uses. */
interface SqliteConnection {
  exec(sql: string): unknown;
  pragma(sql: string): unknown;
  prepare(sql: string): unknown;
}

/**
 * knex begins a transaction with a deferred `BEGIN;`, which takes the write lock only at
 * its first write. With two servers on one file, a transaction that had read and then
 * wrote found the other's commit in between and failed at once with SQLITE_BUSY (WAL
 * snapshot), which busy_timeout cannot wait out: the servers answered 500. Begun IMMEDIATE,
 * a transaction waits for the write lock up front (busy_timeout, a bounded retry inside
 * SQLite) and the servers take turns (SQLite documentation, "BEGIN TRANSACTION").
 */
const BEGIN_WRITE = 'BEGIN IMMEDIATE;';
/** How long a connection waits for another's write lock before SQLITE_BUSY (our choice). */
export const BUSY_TIMEOUT_MS = 5_000;

/** Prepared statements kept per connection (common practice, no source). */
const STATEMENT_CACHE_SIZE = 500;

/**
 * knex compiles every statement again on each call (better-sqlite3's `prepare`, a tenth of
 * a reading's time in a profile); the connection keeps the last STATEMENT_CACHE_SIZE
 * compiled statements by their SQL text instead. knex only runs them with `all` or `run`,
 * which finish before returning, so one statement is never in use twice at once; SQLite
 * recompiles a kept statement itself after a schema change.
 */
function keepPreparedStatements(conn: SqliteConnection): void {
  const prepare = conn.prepare.bind(conn);
  const kept = new Map<string, unknown>();
  conn.prepare = (text: string) => {
    // Write transactions take the write lock when they begin (see BEGIN_WRITE).
    const sql = text === 'BEGIN;' ? BEGIN_WRITE : text;
    let statement = kept.get(sql);
    if (statement) kept.delete(sql);
    else statement = prepare(sql);
    kept.set(sql, statement);
    if (kept.size > STATEMENT_CACHE_SIZE) kept.delete(kept.keys().next().value as string);
    return statement;
  };
}

/**
 * Planner statistics: a file never ANALYZEd makes SQLite drive joins from the biggest
 * table. `PRAGMA optimize` does not analyze never-analyzed tables on the SQLite of the
 * sqlite3 driver (3.44: tried on the bench set, no sqlite_stat1 appeared), so every open
 * runs ANALYZE sampled to analysis_limit rows per index (common practice, no source): a
 * few milliseconds, whatever the size of the file.
 */
const STATISTICS = 'PRAGMA analysis_limit = 1000; ANALYZE;';

/**
 * SQLite in WAL mode with foreign keys on and a busy timeout, set on every pooled
 * connection, with planner statistics gathered when it opens (see STATISTICS).
 * Queries stay portable: nothing here is used by the application SQL.
 */
export function sqliteOptions(dbPath: string): Options {
  if (dbPath !== ':memory:') mkdirSync(dirname(dbPath), { recursive: true });
  return defineSqlite({
    dbName: dbPath,
    entities: ENTITIES,
    metadataProvider: ReflectMetadataProvider,
    // Inherited id and timestamp columns stand where each table has them (base-entities.ts).
    discovery: { afterDiscovered: placeInheritedColumns },
    extensions: [Migrator],
    forceUtcTimezone: true,
    // One query per relation level, each by an indexed key. The default 'joined' strategy
    // made the Lot page one query joining samples, conductors, readings and users in nested
    // parentheses, which SQLite planned over every sample and reading of the file: 30 s on
    // 50 000 lots instead of milliseconds.
    loadStrategy: 'select-in',
    allowGlobalContext: false,
    debug: false,
    migrations: {
      migrationsList: SQLITE_MIGRATIONS,
      transactional: true,
      silent: true,
      allOrNothing: true,
      snapshot: false,
      path: 'apps/backend/src/migrations/sqlite',
      pathTs: 'apps/backend/src/migrations/sqlite',
      emit: 'ts',
    },
    pool: {
      min: 1,
      max: 1,
      afterCreate: (conn: SqliteConnection, done: (err: Error | null, conn: unknown) => void) => {
        try {
          conn.pragma(`busy_timeout = ${BUSY_TIMEOUT_MS}`);
          conn.exec(
            `PRAGMA journal_mode = WAL; PRAGMA foreign_keys = ON; PRAGMA synchronous = FULL; ${STATISTICS}`,
          );
          keepPreparedStatements(conn);
          done(null, conn);
        } catch (err) {
          done(err as Error, conn);
        }
      },
    },
  });
}
