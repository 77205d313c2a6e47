import { ManyToOne, Property, type Opt } from '@mikro-orm/core';
import { User } from './user.entity';
import { IdEntity } from '../../common/base-entities';

/**
 * A record that is never deleted (a reading, a photo): a wrong one is voided with a
 * reason, by whom and when, and stays as evidence.
 */
export abstract class VoidableEntity extends IdEntity {
  @Property({ type: 'boolean' })
  voided: Opt<boolean> = false;

  @Property({ type: 'text', nullable: true })
  voidReason: string | null = null;

  @ManyToOne(() => User, { nullable: true })
  voidedBy: User | null = null;

  @Property({ type: 'Date', nullable: true })
  voidedAt: Date | null = null;
}
