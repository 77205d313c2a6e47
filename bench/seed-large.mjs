// npm run seed:large -- --db PATH --suppliers 200 --lots 50000 [--years 3] [--seed 7]
// Applies the real migrations to a fresh SQLite file through MikroORM (the built server's
// sqlite.config), then bulk-inserts an invented data set with better-sqlite3.
import { existsSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { resolve } from 'node:path';
import Database from 'better-sqlite3';
import { parseArgs } from './lib/args.mjs';
import { seedInstruments, seedSuppliers, seedUsers } from './seed/catalog.mjs';
import { seedCorrectiveActions, seedReturns } from './seed/follow-ups.mjs';
import { deliveryWeights, LotWriter } from './seed/lots.mjs';
import { rng } from './seed/random.mjs';
import { Writer } from './seed/writer.mjs';

const require = createRequire(import.meta.url);
const DAY = 86_400_000;

async function migrate(dbPath, log) {
  const dist = resolve(import.meta.dirname, '../apps/backend/dist/database/sqlite.config.js');
  if (!existsSync(dist)) throw new Error('apps/backend/dist is missing: run `npm run build` first');
  require('reflect-metadata');
  const { MikroORM } = require('@mikro-orm/core');
  const { sqliteOptions } = require(dist);
  const options = sqliteOptions(dbPath);
  const orm = await MikroORM.init({
    ...options,
    migrations: { ...options.migrations, silent: true },
  });
  const applied = await orm.getMigrator().up();
  log(`  migrations applied: ${applied.map((m) => m.name).join(', ')}`);
  await orm.close(true);
}

export async function seedLarge({ db: dbPath, suppliers, lots, years, seed, log = console.log }) {
  const started = performance.now();
  for (const suffix of ['', '-wal', '-shm']) rmSync(dbPath + suffix, { force: true });
  await migrate(dbPath, log);
  const migratedAt = performance.now();

  const db = new Database(dbPath);
  db.pragma('journal_mode = WAL');
  db.pragma('synchronous = OFF');
  // Rows reference ids assigned here, some written before the row they point to;
  // foreign_key_check below proves every reference once all rows are in.
  db.pragma('foreign_keys = OFF');
  const w = new Writer(db);
  const r = rng(seed);
  const now = Date.now();
  const start = now - years * 365 * DAY;

  const ctx = { now, rejected: [] };
  let catalog;
  db.transaction(() => {
    ctx.users = seedUsers(w, start - 30 * DAY);
    ctx.instruments = seedInstruments(w, now);
    catalog = seedSuppliers(w, r, suppliers, start - 30 * DAY);
  })();
  const weights = deliveryWeights(r, catalog);
  const lotWriter = new LotWriter(w, r, ctx);
  const span = now - start - 2 * 3_600_000;
  const batch = 1000;
  const openFrom = lots - Math.max(20, Math.round(lots * 0.005));
  for (let from = 0; from < lots; from += batch) {
    db.transaction(() => {
      for (let i = from; i < Math.min(lots, from + batch); i++) {
        const supplier = r.pick(weights);
        const receivedAt = Math.round(start + (span * (i + r.next())) / lots);
        lotWriter.write(supplier, r.pick(supplier.products), receivedAt, i >= openFrom);
      }
    })();
    if ((from / batch) % 10 === 9) log(`  ${from + batch} lots…`);
  }
  db.transaction(() => {
    seedReturns(w, r, ctx.rejected, ctx.users, now);
    seedCorrectiveActions(w, r, ctx.rejected, ctx.users, now);
  })();
  const broken = db.pragma('foreign_key_check');
  if (broken.length)
    throw new Error(`foreign key check failed: ${JSON.stringify(broken.slice(0, 5))}`);
  db.pragma('wal_checkpoint(TRUNCATE)');
  db.close();

  const seconds = (performance.now() - migratedAt) / 1000;
  const total = w.total();
  for (const [table, n] of [...w.counts].sort()) log(`  ${table}: ${n}`);
  log(
    `seeded ${total} rows in ${seconds.toFixed(1)} s (${Math.round(total / seconds)} rows/s; ` +
      `migrations ${((migratedAt - started) / 1000).toFixed(1)} s) into ${dbPath}`,
  );
  return { rows: total, counts: Object.fromEntries(w.counts) };
}

if (import.meta.main ?? process.argv[1] === import.meta.filename) {
  const defaults = { db: '', suppliers: 200, lots: 50000, years: 3, seed: 7 };
  let args;
  try {
    args = parseArgs(process.argv.slice(2), defaults);
    if (!args.db) throw new Error('--db PATH is required (a scratch SQLite file; it is replaced)');
  } catch (e) {
    console.error(`seed-large: ${e.message}`);
    process.exit(2);
  }
  await seedLarge({ ...args, db: resolve(args.db) });
}
