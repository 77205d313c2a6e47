import type { MigrationObject } from '@mikro-orm/core';
import { Migration20261201224334 } from './Migration20261201224334';

/** SQLite migrations in order; listed in code so the built server needs no globbing. */
export const SQLITE_MIGRATIONS: MigrationObject[] = [
  { name: 'Migration20261201224334', class: Migration20261201224334 },
];
