import { MikroORM } from '@mikro-orm/postgresql';
import { randomBytes } from 'node:crypto';

/**
 * Creates an empty PostgreSQL database on the server of `adminUrl` and returns its URL,
 * with a function that drops it. For tests and the migration generator only.
 */
export async function createScratchDatabase(
  adminUrl: string,
  prefix = 'gp_scratch',
): Promise<{ url: string; drop: () => Promise<void> }> {
  const name = `${prefix}_${randomBytes(5).toString('hex')}`;
  const admin = await MikroORM.init({
    clientUrl: adminUrl,
    entities: [],
    discovery: { warnWhenNoEntities: false },
    allowGlobalContext: true,
  });
  await admin.em.getConnection().execute(`create database ${name}`);
  await admin.close(true);
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    drop: async () => {
      const again = await MikroORM.init({
        clientUrl: adminUrl,
        entities: [],
        discovery: { warnWhenNoEntities: false },
        allowGlobalContext: true,
      });
      await again.em.getConnection().execute(`drop database if exists ${name} with (force)`);
      await again.close(true);
    },
  };
}
