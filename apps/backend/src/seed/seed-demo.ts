import type { EntityManager } from '@mikro-orm/core';
import { User } from '../users/entities/user.entity';
import { seedCatalog } from './seed-catalog';
import { seedUsers } from './seed-users';

/**
 * Fills an empty database with the invented demo scenario. Does nothing when any user
 * exists, so it never touches real data.
 */
export async function seedDemo(em: EntityManager): Promise<void> {
  if ((await em.count(User)) > 0) return;
  await em.transactional(async (tx) => {
    await seedUsers(tx);
    await seedCatalog(tx);
  });
}
