import type { EntityManager } from '@mikro-orm/core';
import bcrypt from 'bcryptjs';
import { User } from '../users/entities/user.entity';
import { DEMO_PASSWORD, DEMO_USERS } from './seed-users';

/**
 * The demo accounts that are active and still open with the password the README publishes.
 * A server started without SEED_DEMO warns about them at every start (app.factory.ts).
 */
export async function openDemoAccounts(em: EntityManager): Promise<string[]> {
  const users = await em.find(
    User,
    { email: { $in: DEMO_USERS.map((u) => u.email) }, active: true },
    { populate: ['passwordHash'], orderBy: { id: 'asc' } },
  );
  const open: string[] = [];
  for (const u of users) {
    if (await bcrypt.compare(DEMO_PASSWORD, u.passwordHash)) open.push(u.email);
  }
  return open;
}

export function demoAccountsWarning(emails: string[]): string {
  return `Demo accounts are active with the published demo password: ${emails.join(', ')}. Anyone who has read the README can sign in, as admin too. Deactivate them or give them new passwords on the Users screen; SEED_DEMO=true is for trying the product only.`;
}
