import { Entity, ManyToOne, PrimaryKey, Property, Unique, type Opt } from '@mikro-orm/core';
import { CorrectiveAction } from './corrective-action.entity';
import { User } from '../../users/entities/user.entity';
import { clock } from '../../common/clock';

/**
 * A link that lets a supplier answer one corrective-action request without an account.
 * Only the SHA-256 of the token is kept; the token itself is in the e-mail and nowhere else.
 */
@Entity({ tableName: 'supplier_links' })
export class SupplierLink {
  @PrimaryKey({ type: 'integer' })
  id!: number;

  @Property({ type: 'string', length: 64 })
  @Unique()
  tokenHash!: string;

  @ManyToOne(() => CorrectiveAction, { deleteRule: 'cascade' })
  correctiveAction!: CorrectiveAction;

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
