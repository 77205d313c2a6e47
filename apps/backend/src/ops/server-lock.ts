import Database from 'better-sqlite3';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';

/**
 * A lock every server takes on its SQLite database at start and holds while it runs: a
 * shared lock (a read transaction kept open) on `<DB_PATH>.server-lock`, a small SQLite
 * file beside the database. Several servers may share it; `npm run restore` needs it
 * exclusively, so it refuses while any server runs, and the operating system drops the
 * lock of a server that dies (SQLite's locks are POSIX file locks).
 */
export function lockFileOf(dbPath: string): string {
  return `${dbPath}.server-lock`;
}

export interface ServerLock {
  release(): void;
}

export function holdServerLock(dbPath: string): ServerLock {
  const file = lockFileOf(dbPath);
  if (!existsSync(file)) {
    const init = new Database(file, { timeout: 5_000 });
    try {
      init.pragma('user_version = 1');
    } finally {
      init.close();
    }
  }
  const db = new Database(file, { timeout: 5_000 });
  db.exec('begin');
  db.prepare('select count(*) from sqlite_master').get();
  writeFileSync(`${dbPath}.server-pid`, `${process.pid}\n`);
  return {
    release() {
      if (!db.open) return;
      db.exec('rollback');
      db.close();
    },
  };
}

/** A server runs on the database: restore refuses, saying how to stop it. */
export class DatabaseInUseError extends Error {
  constructor(dbPath: string) {
    let pid = '';
    try {
      pid = readFileSync(`${dbPath}.server-pid`, 'utf8').trim();
    } catch {
      // no pid file: the message goes without it
    }
    super(
      `A Gaugeproof server is running on ${dbPath}${pid ? ` (the last one started was process ${pid})` : ''}. ` +
        'Stop every server using this database first (Ctrl+C where `npm start` runs, or `kill <pid>`, ' +
        'or stop its service), then run the restore again. Nothing was changed.',
    );
  }
}

/**
 * Runs `work` holding the database's server lock exclusively: refused at once (with
 * DatabaseInUseError) while any server runs, and no server can start until it is done.
 */
export function withDatabaseExclusive<T>(dbPath: string, work: () => T): T {
  const file = lockFileOf(dbPath);
  const db = new Database(file, { timeout: 0 });
  try {
    try {
      db.exec('begin exclusive');
    } catch (e) {
      if ((e as { code?: string }).code?.startsWith('SQLITE_BUSY')) {
        throw new DatabaseInUseError(dbPath);
      }
      throw e;
    }
    try {
      return work();
    } finally {
      db.exec('rollback');
    }
  } finally {
    db.close();
  }
}

/** True when a running server holds the database. */
export function serverHoldsDatabase(dbPath: string): boolean {
  try {
    withDatabaseExclusive(dbPath, () => undefined);
    return false;
  } catch (e) {
    if (e instanceof DatabaseInUseError) return true;
    throw e;
  }
}
