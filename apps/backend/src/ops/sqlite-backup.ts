import Database from 'better-sqlite3';
import { cpSync, existsSync, mkdirSync, renameSync, rmSync } from 'node:fs';
import { dirname } from 'node:path';

/**
 * Copies a live SQLite database with SQLite's online backup API (better-sqlite3's
 * `backup`): a consistent snapshot even while the server writes (the API restarts the copy
 * when the source changes). Writes to a temporary file and renames it into place, so a
 * failed backup leaves nothing.
 */
export async function backupDatabase(source: string, target: string): Promise<void> {
  if (!existsSync(source)) throw new Error(`No database at ${source}`);
  mkdirSync(dirname(target), { recursive: true });
  const partial = `${target}.partial`;
  rmSync(partial, { force: true });
  const db = new Database(source, { readonly: true, fileMustExist: true });
  try {
    await db.backup(partial);
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

/** Puts a backup in place of the database: removes the old WAL and shared-memory files. */
export function restoreDatabase(backup: string, target: string): void {
  if (!existsSync(backup)) throw new Error(`No backup at ${backup}`);
  mkdirSync(dirname(target), { recursive: true });
  const staged = `${target}.restoring`;
  cpSync(backup, staged);
  for (const suffix of ['-wal', '-shm']) rmSync(`${target}${suffix}`, { force: true });
  renameSync(staged, target);
}
