import { CONCESSION_STATUSES, type ConcessionStatus } from '@gaugeproof/api-types';
import { Entity, Enum, Index, ManyToOne, Property, type Opt } from '@mikro-orm/core';
import { clock } from '../../common/clock';
import { Lot } from '../../lots/entities/lot.entity';
import { User } from '../../users/entities/user.entity';
import { Decision } from './decision.entity';
import { IdEntity } from '../../common/base-entities';

/**
 * `pending`: asked for, waiting for a second QA lead or an admin (the product's policy
 * wants one when the lot's recommendation is reject); `approved`: in force, with its
 * decision; `refused`: turned down, with a note (or withdrawn by its requester).
 */
export { CONCESSION_STATUSES, type ConcessionStatus };

/**
 * The terms a lot is accepted on against its criteria (issue 14 §7): what the material may
 * be used for, how much of it, until when, and who approved it.
 */
@Entity({ tableName: 'concessions' })
@Index({ properties: ['lot', 'status'] })
export class Concession extends IdEntity {
  @ManyToOne(() => Lot)
  lot!: Lot;

  @Enum({ items: () => CONCESSION_STATUSES, type: 'string' })
  status: Opt<ConcessionStatus> = 'pending';

  /** What the material may be used for, e.g. "ground runs of 1 m or less, not power". */
  @Property({ type: 'text' })
  scope!: string;

  /** How much of the lot, in the lot's unit. */
  @Property({ type: 'double' })
  quantity!: number;

  @Property({ type: 'string', length: 10 })
  expiresOn!: string;

  /** The requester's reason (also the decision's reason once approved). */
  @Property({ type: 'text' })
  reason!: string;

  /** The evaluation's recommendation when asked for. */
  @Property({ type: 'string', length: 16 })
  recommendation!: string;

  /** Whether a second QA lead or an admin had to approve it. */
  @Property({ type: 'boolean' })
  needsSecondApproval!: boolean;

  /** The lot version it was asked on; approval on a changed lot is refused. */
  @Property({ type: 'integer' })
  lotVersion!: number;

  @ManyToOne(() => User)
  requestedBy!: User;

  @Property({ type: 'Date' })
  requestedAt: Opt<Date> = clock.now();

  /** Who approved or refused it (the requester when no second approval was needed). */
  @ManyToOne(() => User, { nullable: true })
  reviewedBy: User | null = null;

  @Property({ type: 'Date', nullable: true })
  reviewedAt: Date | null = null;

  @Property({ type: 'text', nullable: true })
  reviewNote: string | null = null;

  /** The accept-on-concession decision it put in force. */
  @ManyToOne(() => Decision, { nullable: true })
  decision: Decision | null = null;

  /** Optimistic lock: two approvers at once, one wins. */
  @Property({ type: 'integer', version: true })
  version!: Opt<number>;
}
