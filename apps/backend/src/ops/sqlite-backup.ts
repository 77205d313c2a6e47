import Database from 'better-sqlite3';
import { cpSync, existsSync, mkdirSync, renameSync, rmSync } from 'node:fs';
import { dirname } from 'node:path';
import { withDatabaseExclusive } from './server-lock';

/**
 * Copies a live SQLite database with `VACUUM INTO` (SQLite 3.27+): one read transaction,
 * so a consistent snapshot that writers in WAL mode never restart. The online backup API
 * used before restarted its copy whenever the source changed: on the 1.8 GB bench set one
 * reading a second kept it from ever finishing. Writes to a temporary file and renames it
 * into place, so a failed backup leaves nothing.
 */
export async function backupDatabase(source: string, target: string): Promise<void> {
  if (!existsSync(source)) throw new Error(`No database at ${source}`);
  mkdirSync(dirname(target), { recursive: true });
  const partial = `${target}.partial`;
  rmSync(partial, { force: true });
  const db = new Database(source, { readonly: true, fileMustExist: true });
  try {
    db.prepare('VACUUM INTO ?').run(partial);
  } catch (err) {
    rmSync(partial, { force: true });
    throw err;
  } finally {
    db.close();
  }
  renameSync(partial, target);
}

/** Copies a folder tree (the photo store) next to the database copy. */
export function copyFolder(from: string, to: string): void {
  rmSync(to, { recursive: true, force: true });
  if (existsSync(from)) cpSync(from, to, { recursive: true });
  else mkdirSync(to, { recursive: true });
}

/**
 * Puts a backup in place of the database, removing the old WAL and shared-memory files;
 * refused (DatabaseInUseError) while any server holds the database, whose later writes
 * would otherwise be lost, and no server can start until it is done (ops/server-lock.ts).
 * `also` runs under the same lock (the uploads folder).
 */
export function restoreDatabase(backup: string, target: string, also?: () => void): void {
  if (!existsSync(backup)) throw new Error(`No backup at ${backup}`);
  mkdirSync(dirname(target), { recursive: true });
  withDatabaseExclusive(target, () => {
    const staged = `${target}.restoring`;
    cpSync(backup, staged);
    for (const suffix of ['-wal', '-shm']) rmSync(`${target}${suffix}`, { force: true });
    renameSync(staged, target);
    also?.();
  });
}
