import { MikroORM } from '@mikro-orm/core';
import { describe, expect, it } from 'vitest';
import { createScratchDatabase } from '../src/database/pg-scratch';
import { postgresOptions } from '../src/database/postgres.config';
import { pendingSchemaChanges, requirePgAdminUrl } from './helpers/schema';

describe('PostgreSQL migrations', () => {
  it('build exactly the schema the entities describe', async () => {
    const scratch = await createScratchDatabase(requirePgAdminUrl(), 'gp_mig');
    const orm = await MikroORM.init(postgresOptions(scratch.url));
    try {
      expect(await pendingSchemaChanges(orm)).toBe('');
    } finally {
      await orm.close(true);
      await scratch.drop();
    }
  });
});
