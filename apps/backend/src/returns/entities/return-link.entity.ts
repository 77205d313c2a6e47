import { Entity, ManyToOne, PrimaryKey, Property, Unique, type Opt } from '@mikro-orm/core';
import { VendorReturn } from './vendor-return.entity';
import { User } from '../../users/entities/user.entity';
import { clock } from '../../common/clock';

/**
 * A link that shows a supplier one return notice (what was found: the lots, the evidence
 * pack and their photos) without an account. Only the SHA-256 of the token is kept.
 */
@Entity({ tableName: 'return_links' })
export class ReturnLink {
  @PrimaryKey({ type: 'integer' })
  id!: number;

  @Property({ type: 'string', length: 64 })
  @Unique()
  tokenHash!: string;

  @ManyToOne(() => VendorReturn, { deleteRule: 'cascade' })
  vendorReturn!: VendorReturn;

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
