import type { EntityManager } from '@mikro-orm/core';
import bcrypt from 'bcryptjs';
import type { Role } from '../auth/roles';
import { User } from '../users/entities/user.entity';

/** Demo-only accounts; the README lists them. Invented people. */
export const DEMO_PASSWORD = 'gaugeproof-demo';
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'clerk@demo.example', name: 'Rosa Okafor', role: 'clerk' },
  { email: 'qa@demo.example', name: 'Tomasz Lindqvist', role: 'qa_lead' },
  { email: 'buyer@demo.example', name: 'Priya Marchetti', role: 'purchasing' },
  { email: 'admin@demo.example', name: 'Dale Ferreira', role: 'admin' },
];

export async function seedUsers(em: EntityManager): Promise<User[]> {
  const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
  const users = DEMO_USERS.map((u) => em.create(User, { ...u, passwordHash: hash, active: true }));
  await em.persist(users).flush();
  return users;
}

/** The demo accounts this database holds and can sign in with (for the start banner). */
export async function demoAccountsPresent(
  em: EntityManager,
): Promise<{ email: string; role: Role }[]> {
  const found = await em.find(
    User,
    { email: { $in: DEMO_USERS.map((u) => u.email) }, active: true },
    { fields: ['email', 'role'] },
  );
  const present = new Set(found.map((u) => u.email));
  return DEMO_USERS.filter((u) => present.has(u.email)).map(({ email, role }) => ({ email, role }));
}
