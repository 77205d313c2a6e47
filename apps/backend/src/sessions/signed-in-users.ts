import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { User } from '../users/entities/user.entity';
import { plainSql } from '../common/plain-sql';

export type SignedInUser = Pick<
  User,
  'id' | 'email' | 'name' | 'role' | 'active' | 'sessionVersion'
>;

/**
 * The account behind a session, as the sign-in check needs it on every request: read from
 * the database each time, not kept. A kept copy let a deactivated or demoted admin act
 * for up to 5 s on another server sharing the database (long enough to create a new
 * admin), and kept ended sessions alive. One primary-key read per request: a cache keyed
 * by the database's change counters (common/counted-cache.ts) would be exact across
 * servers, but reading the counters is a query of the same cost.
 */
@Injectable()
export class SignedInUsers {
  constructor(private readonly em: EntityManager) {}

  /** The account with this id, or null when there is none. */
  async byId(id: number): Promise<SignedInUser | null> {
    const [row] = await plainSql<
      { id: number; email: string; name: string; role: User['role']; active: unknown; sv: number }[]
    >(
      this.em,
      'select id, email, name, role, active, session_version as sv from users where id = ?',
      [id],
    );
    if (!row) return null;
    return {
      id: row.id,
      email: row.email,
      name: row.name,
      role: row.role,
      // 0/1 on SQLite, a boolean on PostgreSQL.
      active: row.active === true || row.active === 1,
      sessionVersion: Number(row.sv),
    };
  }
}
