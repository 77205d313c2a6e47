import type { MikroORM } from '@mikro-orm/core';

/** Applies a driver's migrations to an empty database and returns what the entities still need. */
export async function pendingSchemaChanges(orm: MikroORM): Promise<string> {
  await orm.getMigrator().up();
  return (await orm.getSchemaGenerator().getUpdateSchemaSQL({ wrap: false })).trim();
}

/** The PostgreSQL pass (npm run test:pg) needs a server; scripts/pg-cluster.sh starts one. */
export function requirePgAdminUrl(): string {
  const url = process.env.TEST_PG_ADMIN_URL;
  if (!url) throw new Error('TEST_PG_ADMIN_URL is not set: start scripts/pg-cluster.sh first');
  return url;
}
