import { Entity, Enum, Property, Unique, type Opt } from '@mikro-orm/core';
import { ROLES, type Role } from '../../auth/roles';
import { TimestampedEntity, InheritedColumns } from '../../common/base-entities';

@Entity({ tableName: 'users' })
@InheritedColumns({ before: 'sessionVersion' })
export class User extends TimestampedEntity {
  @Property({ type: 'string', length: 254 })
  @Unique()
  email!: string;

  @Property({ type: 'string', length: 120 })
  name!: string;

  @Property({ type: 'string', length: 100, hidden: true, lazy: true })
  passwordHash!: string;

  @Enum({ items: () => ROLES, type: 'string' })
  role!: Role;

  @Property({ type: 'boolean' })
  active: Opt<boolean> = true;

  // Last, as the migration adds it (SQLite compares column order).
  /**
   * Sessions carry the version they were signed in under; sign-out, a password change, a
   * deactivation and a role change raise it, and every request compares (auth.guard.ts), so
   * older sessions end at once on every server.
   */
  @Property({ type: 'integer', default: 1 })
  sessionVersion: Opt<number> = 1;

  /**
   * The account's edit version: an admin's edit names the one they loaded and a stale one
   * gets 409 (issue 17 item 7). Moves only with the admin's edits (sign-out raises the
   * session version with plain SQL, not this).
   */
  @Property({ type: 'integer', version: true })
  version!: Opt<number>;
}
