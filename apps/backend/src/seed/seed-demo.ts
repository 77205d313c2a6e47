import type { EntityManager } from '@mikro-orm/core';
import type { StorageService } from '../storage/storage.service';
import { User } from '../users/entities/user.entity';
import { seedCatalog } from './seed-catalog';
import { seedScenario } from './seed-scenario';
import { seedUsers } from './seed-users';

/**
 * Fills an empty database with the invented demo: users and catalog, and unless `history`
 * is off, the scenario's months of lots, readings, photos, decisions, returns and SCARs.
 * Does nothing when any user exists, so it never touches real data.
 */
export async function seedDemo(
  em: EntityManager,
  storage: StorageService,
  history = true,
): Promise<void> {
  if ((await em.count(User)) > 0) return;
  await em.transactional(async (tx) => {
    await seedUsers(tx);
    const catalog = await seedCatalog(tx);
    if (history) await seedScenario(tx, storage, catalog);
  });
}
