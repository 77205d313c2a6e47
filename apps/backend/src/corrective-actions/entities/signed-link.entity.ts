import { ManyToOne, Property, Unique, type Opt } from '@mikro-orm/core';
import { clock } from '../../common/clock';
import { IdEntity, InheritedColumns } from '../../common/base-entities';
import { User } from '../../users/entities/user.entity';

/**
 * A link that lets a supplier see or answer one record without an account (`ReturnLink`,
 * `SupplierLink`: each adds the record it opens). Only the SHA-256 of the token is kept;
 * the token itself is in the e-mail and nowhere else.
 */
@InheritedColumns({ leading: ['tokenHash'] })
export abstract class SignedLink extends IdEntity {
  @Property({ type: 'string', length: 64 })
  @Unique()
  tokenHash!: string;

  @Property({ type: 'string', length: 254 })
  sentTo!: string;

  @Property({ type: 'Date' })
  expiresAt!: Date;

  @Property({ type: 'Date', nullable: true })
  revokedAt: Date | null = null;

  @Property({ type: 'Date', nullable: true })
  lastOpenedAt: Date | null = null;

  @ManyToOne(() => User)
  createdBy!: User;

  @Property({ type: 'Date' })
  createdAt: Opt<Date> = clock.now();
}
