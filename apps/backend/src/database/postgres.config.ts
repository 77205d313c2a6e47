import { defineConfig as definePostgres } from '@mikro-orm/postgresql';
import { Migrator } from '@mikro-orm/migrations';
import { ReflectMetadataProvider, type Options } from '@mikro-orm/core';
import { ENTITIES } from './entities';
import { placeInheritedColumns } from '../common/base-entities';
import { POSTGRES_MIGRATIONS } from '../migrations';

/** PostgreSQL, for a business that outgrows one machine: same entities, own migrations. */
export function postgresOptions(dbUrl: string): Options {
  return definePostgres({
    clientUrl: dbUrl,
    entities: ENTITIES,
    metadataProvider: ReflectMetadataProvider,
    // Inherited id and timestamp columns stand where each table has them (base-entities.ts).
    discovery: { afterDiscovered: placeInheritedColumns },
    extensions: [Migrator],
    forceUtcTimezone: true,
    // One query per relation level, each by an indexed key. The default 'joined' strategy
    // made the Lot page one query joining samples, conductors, readings and users in nested
    // parentheses, which SQLite planned over every sample and reading of the file: 30 s on
    // 50 000 lots instead of milliseconds.
    loadStrategy: 'select-in',
    allowGlobalContext: false,
    debug: false,
    pool: { min: 1, max: 10 },
    migrations: {
      migrationsList: POSTGRES_MIGRATIONS,
      transactional: true,
      silent: true,
      allOrNothing: true,
      snapshot: false,
      path: 'apps/backend/src/migrations/postgresql',
      pathTs: 'apps/backend/src/migrations/postgresql',
      emit: 'ts',
    },
  });
}
