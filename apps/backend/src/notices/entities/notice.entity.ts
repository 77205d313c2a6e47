import { Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { User } from '../../users/entities/user.entity';
import { CreatedEntity } from '../../common/base-entities';

export const NOTICE_KINDS = [
  'lot_awaits_decision',
  'lot_reject_number',
  'lot_rejected',
  'scar_overdue',
  'scar_answered',
  'concession_awaits_approval',
] as const;
export type NoticeKind = (typeof NOTICE_KINDS)[number];

/**
 * A notice owed to one user. `key` names the event (e.g. `lot_rejected:41`): the unique
 * (user, key) pair makes a notice once per event, however often or by however many servers
 * the event is seen. `messageId` is the outbound message that carried it: set at once for a
 * single e-mail, by the digest job for a digest one; null while it waits for the digest.
 */
@Entity({ tableName: 'notices' })
@Unique({ properties: ['user', 'key'] })
@Index({ properties: ['delivery', 'messageId'] })
export class Notice extends CreatedEntity {
  @ManyToOne(() => User, { deleteRule: 'cascade' })
  user!: User;

  @Property({ type: 'string', length: 32 })
  kind!: NoticeKind;

  @Property({ type: 'string', length: 160 })
  key!: string;

  @Property({ type: 'string', length: 300 })
  subject!: string;

  @Property({ type: 'text' })
  body!: string;

  /** `single` (its own e-mail) or `digest` (in the next daily digest). */
  @Property({ type: 'string', length: 8 })
  delivery!: 'single' | 'digest';

  @Property({ type: 'integer', nullable: true })
  messageId: number | null = null;
}
