import type { EntityManager } from '@mikro-orm/core';
import { existsSync } from 'node:fs';
import { readdir, rm, stat } from 'node:fs/promises';
import { join, relative, sep } from 'node:path';
import { plainSql } from '../common/plain-sql';

/**
 * Files younger than this are left alone: another server sharing the folder may be between
 * writing a photo and committing its row (our choice: far above one upload's time).
 */
export const SWEEP_GRACE_MS = 10 * 60_000;

export interface SweepResult {
  partial: number;
  orphans: number;
}

/**
 * At start, removes from the local upload folder what a killed server left behind:
 * temporary files of writes cut off (`.<uuid>.tmp`) and photo files no photo row names
 * (stored, then the process died before the row committed). Files newer than
 * SWEEP_GRACE_MS stay. Rows are never touched.
 */
export async function sweepUploads(
  em: EntityManager,
  uploadDir: string,
  now = Date.now(),
): Promise<SweepResult> {
  const result: SweepResult = { partial: 0, orphans: 0 };
  if (!existsSync(uploadDir)) return result;
  const rows = await plainSql<{ storage_key: string; thumbnail_key: string }[]>(
    em,
    'select storage_key, thumbnail_key from photos',
  );
  const known = new Set(rows.flatMap((r) => [r.storage_key, r.thumbnail_key]));
  const entries = await readdir(uploadDir, { recursive: true, withFileTypes: true });
  for (const entry of entries) {
    if (!entry.isFile()) continue;
    const full = join(entry.parentPath, entry.name);
    const key = relative(uploadDir, full).split(sep).join('/');
    const partial = entry.name.startsWith('.') && entry.name.endsWith('.tmp');
    if (!partial && (known.has(key) || !key.startsWith('photos/'))) continue;
    const { mtimeMs } = await stat(full);
    if (now - mtimeMs < SWEEP_GRACE_MS) continue;
    await rm(full, { force: true });
    if (partial) result.partial++;
    else result.orphans++;
  }
  return result;
}
