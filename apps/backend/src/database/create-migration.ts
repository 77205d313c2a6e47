import 'reflect-metadata';
import { MikroORM, type Options } from '@mikro-orm/core';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createScratchDatabase } from './pg-scratch';
import { postgresOptions } from './postgres.config';
import { sqliteOptions } from './sqlite.config';

/**
 * Writes a new migration for one driver with the difference between the entities and the
 * schema the existing migrations of that driver build. From the repository root, after
 * `npx tsc -b apps/backend/tsconfig.build.json`:
 *   node apps/backend/dist/database/create-migration.js sqlite
 *   PG_ADMIN_URL=postgresql://user@127.0.0.1:55432/postgres \
 *     node apps/backend/dist/database/create-migration.js postgresql
 * then add the new class to src/migrations/index.ts.
 */
async function main() {
  const driver = process.argv[2] ?? 'sqlite';
  let options: Options;
  let cleanup: () => Promise<void>;
  if (driver === 'sqlite') {
    const dir = mkdtempSync(join(tmpdir(), 'gp-migrate-'));
    options = sqliteOptions(join(dir, 'scratch.sqlite'));
    cleanup = async () => rmSync(dir, { recursive: true, force: true });
  } else if (driver === 'postgresql') {
    const admin = process.env.PG_ADMIN_URL;
    if (!admin) throw new Error('Set PG_ADMIN_URL to a PostgreSQL server (scripts/pg-cluster.sh)');
    const scratch = await createScratchDatabase(admin, 'gp_migrate');
    options = postgresOptions(scratch.url);
    cleanup = scratch.drop;
  } else {
    throw new Error('usage: create-migration.js sqlite|postgresql');
  }
  const orm = await MikroORM.init(options);
  try {
    const migrator = orm.getMigrator();
    await migrator.up();
    const result = await migrator.createMigration();
    console.log(result.fileName ? `wrote ${result.fileName}` : 'no schema changes');
  } finally {
    await orm.close(true);
    await cleanup();
  }
}

void main();
