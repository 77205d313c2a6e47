import sqlite3 from 'sqlite3';
import { cpSync, existsSync, mkdirSync, renameSync, rmSync } from 'node:fs';
import { dirname } from 'node:path';

/** The backup API of node-sqlite3 (missing from its type declarations). */
interface SqliteBackup {
  step(pages: number, cb: (err: Error | null) => void): void;
  finish(cb: (err: Error | null) => void): void;
  readonly completed: boolean;
  readonly failed: boolean;
}
type BackupCapable = sqlite3.Database & {
  backup(file: string, cb: (err: Error | null) => void): SqliteBackup;
};

function open(file: string, mode: number): Promise<sqlite3.Database> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, mode, (err) => (err ? reject(err) : resolve(db)));
  });
}

function close(db: sqlite3.Database): Promise<void> {
  return new Promise((resolve, reject) => db.close((err) => (err ? reject(err) : resolve())));
}

/**
 * Copies a live SQLite database with SQLite's online backup API: a consistent snapshot
 * even while the server writes (the API restarts the copy when the source changes).
 * Writes to a temporary file and renames it into place, so a failed backup leaves nothing.
 */
export async function backupDatabase(source: string, target: string): Promise<void> {
  if (!existsSync(source)) throw new Error(`No database at ${source}`);
  mkdirSync(dirname(target), { recursive: true });
  const partial = `${target}.partial`;
  rmSync(partial, { force: true });
  const db = (await open(source, sqlite3.OPEN_READONLY)) as BackupCapable;
  try {
    await new Promise<void>((resolve, reject) => {
      const backup = db.backup(partial, (err: Error | null) => {
        if (err) return reject(err);
        const step = () =>
          backup.step(-1, (stepErr: Error | null) => {
            if (stepErr) return reject(stepErr);
            if (backup.completed) return backup.finish(() => resolve());
            if (backup.failed) return reject(new Error('SQLite backup failed'));
            setTimeout(step, 20);
          });
        step();
      });
    });
  } finally {
    await close(db);
  }
  renameSync(partial, target);
}

/** Copies a folder tree (the photo store) next to the database copy. */
export function copyFolder(from: string, to: string): void {
  rmSync(to, { recursive: true, force: true });
  if (existsSync(from)) cpSync(from, to, { recursive: true });
  else mkdirSync(to, { recursive: true });
}

/** Puts a backup in place of the database: removes the old WAL and shared-memory files. */
export function restoreDatabase(backup: string, target: string): void {
  if (!existsSync(backup)) throw new Error(`No backup at ${backup}`);
  mkdirSync(dirname(target), { recursive: true });
  const staged = `${target}.restoring`;
  cpSync(backup, staged);
  for (const suffix of ['-wal', '-shm']) rmSync(`${target}${suffix}`, { force: true });
  renameSync(staged, target);
}
