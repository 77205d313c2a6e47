// The large data set, built once per set of parameters (and version of the seed code)
// under .bench-cache/, and copied to a scratch file for every run. Migrations added after
// the set was built are applied by the server when it starts on the copy, as they would be
// on a customer's file, so a new index does not cost a new seed.
import { createHash } from 'node:crypto';
import {
  copyFileSync,
  existsSync,
  mkdirSync,
  readdirSync,
  readFileSync,
  renameSync,
} from 'node:fs';
import { join } from 'node:path';
import { seedLarge } from '../seed-large.mjs';

const ROOT = join(import.meta.dirname, '..', '..');
const CACHE = join(ROOT, '.bench-cache');

function codeHash() {
  const h = createHash('sha256');
  const files = [
    ...readdirSync(join(ROOT, 'bench/seed')).map((f) => join(ROOT, 'bench/seed', f)),
    join(ROOT, 'bench/seed-large.mjs'),
  ].sort();
  for (const f of files) h.update(readFileSync(f));
  return h.digest('hex').slice(0, 10);
}

export async function cachedDataset(params) {
  mkdirSync(CACHE, { recursive: true });
  const key = `s${params.suppliers}-l${params.lots}-y${params.years}-r${params.seed}-${codeHash()}`;
  const file = join(CACHE, `${key}.sqlite`);
  if (existsSync(file)) return { file, built: false };
  const partial = join(CACHE, `${key}.partial.sqlite`);
  const stats = await seedLarge({ ...params, db: partial });
  renameSync(partial, file);
  return { file, built: true, stats };
}

export function scratchCopy(file, dir, name = 'bench.sqlite') {
  const target = join(dir, name);
  copyFileSync(file, target);
  return target;
}
