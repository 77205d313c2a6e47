import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/core';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { sqliteOptions } from './mikro-orm.config';

/**
 * Writes a new SQLite migration with the difference between the entities and the schema
 * the existing migrations build. Run from the repository root after `npm run build`:
 *   node apps/backend/dist/database/create-migration.js
 * then add the new class to src/migrations/index.ts.
 */
async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'gp-migrate-'));
  const orm = await MikroORM.init(sqliteOptions(join(dir, 'scratch.sqlite')));
  try {
    const migrator = orm.getMigrator();
    await migrator.up();
    const result = await migrator.createMigration();
    console.log(result.fileName ? `wrote ${result.fileName}` : 'no schema changes');
  } finally {
    await orm.close(true);
    rmSync(dir, { recursive: true, force: true });
  }
}

void main();
