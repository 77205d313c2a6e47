import { MikroORM } from '@mikro-orm/core';
import type { INestApplicationContext } from '@nestjs/common';
import { NoticesService } from '../notices/notices.service';
import { User } from '../users/entities/user.entity';
import { seedCatalog } from './seed-catalog';
import { seedScenario } from './seed-scenario';
import { seedUsers } from './seed-users';

/**
 * Fills an empty database with the invented demo: users and catalog, and unless `history`
 * is off, the scenario's months of lots, readings, photos, decisions, returns and SCARs,
 * told through the application's own services (Nest's container) in one transaction.
 * Its old events raise no notices and send no e-mail (`NoticesService.withheld`).
 * Does nothing when any user exists, so it never touches real data.
 */
export async function seedDemo(app: INestApplicationContext, history = true): Promise<void> {
  const orm = app.get(MikroORM);
  if ((await orm.em.fork().count(User)) > 0) return;
  await app.get(NoticesService).withheld(() =>
    orm.em.transactional(async (tx) => {
      await seedUsers(tx);
      const catalog = await seedCatalog(tx);
      if (history) await seedScenario(app, tx, catalog);
    }),
  );
}
