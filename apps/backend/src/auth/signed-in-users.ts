import { Injectable } from '@nestjs/common';
import { CacheProvider, WriteInvalidatedCache } from '../common/write-invalidated-cache';
import { User } from '../users/entities/user.entity';
import { plainSql } from '../common/plain-sql';

export type SignedInUser = Pick<User, 'id' | 'email' | 'name' | 'role' | 'active'>;

/**
 * A deactivation or role change made on another server sharing the database is seen
 * within this (our choice); on this server it is seen at once.
 */
const MAX_AGE_MS = 5_000;
/** Accounts remembered; the oldest is dropped beyond it (our choice: far above any shop's staff). */
const MAX_ENTRIES = 1_000;

/**
 * The account behind a session, as the sign-in check needs it on every request. Kept until
 * the next write to any user (a deactivation or role change through the users screen
 * clears it), so a request does not read the users table each time (about 3 % of a
 * lot-list request).
 */
@Injectable()
export class SignedInUsers extends CacheProvider {
  private readonly cache = new WriteInvalidatedCache<SignedInUser | null>(
    [User],
    MAX_AGE_MS,
    MAX_ENTRIES,
  );

  protected readonly caches = [this.cache];

  /** The account with this id, or null when there is none. */
  byId(id: number): Promise<SignedInUser | null> {
    return this.cache.get(String(id), async () => {
      const [user] = await plainSql<SignedInUser[]>(
        this.em,
        'select id, email, name, role, active from users where id = ?',
        [id],
      );
      return user ?? null;
    });
  }
}
