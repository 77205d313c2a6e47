import { Entity, OneToOne, Property, type Opt } from '@mikro-orm/core';
import { User } from '../../users/entities/user.entity';
import { clock } from '../../common/clock';

/**
 * One user's e-mail notices, each switchable (issue 14 §6). A user without a row has the
 * defaults of their role (`defaultSettings`). `digestSentOn` is the day (UTC, YYYY-MM-DD)
 * of the last daily digest: the digest job is driven by it, so a restart neither repeats
 * nor skips a day's digest.
 */
@Entity({ tableName: 'notice_settings' })
export class NoticeSettings {
  @OneToOne(() => User, { primary: true, deleteRule: 'cascade' })
  user!: User;

  @Property({ type: 'boolean' })
  lotAwaitsDecision!: boolean;

  @Property({ type: 'boolean' })
  lotRejectNumber!: boolean;

  @Property({ type: 'boolean' })
  lotRejected!: boolean;

  @Property({ type: 'boolean' })
  scarOverdue!: boolean;

  @Property({ type: 'boolean' })
  scarAnswered!: boolean;

  /** QA lead, admin: a concession against a reject waits for a second approval. */
  @Property({ type: 'boolean' })
  concessionAwaitsApproval!: boolean;

  /** One e-mail a day with every notice instead of one e-mail each. */
  @Property({ type: 'boolean' })
  digest!: boolean;

  @Property({ type: 'string', length: 10, nullable: true })
  digestSentOn: string | null = null;

  @Property({ type: 'Date', onUpdate: () => clock.now() })
  updatedAt: Opt<Date> = clock.now();
}
