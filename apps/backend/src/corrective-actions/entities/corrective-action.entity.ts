import {
  Collection,
  Entity,
  Enum,
  ManyToMany,
  ManyToOne,
  Property,
  Unique,
  type Opt,
} from '@mikro-orm/core';
import { Lot } from '../../lots/entities/lot.entity';
import { Supplier } from '../../suppliers/entities/supplier.entity';
import { User } from '../../users/entities/user.entity';
import { CAR_STATUSES, type CorrectiveActionStatus } from '@gaugeproof/api-types';
import { TimestampedEntity } from '../../common/base-entities';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { CAR_STATUSES, type CorrectiveActionStatus };

/** Supplier corrective action request (SCAR). */
@Entity({ tableName: 'corrective_actions' })
export class CorrectiveAction extends TimestampedEntity {
  @Property({ type: 'string', length: 20 })
  @Unique()
  number!: string;

  @ManyToOne(() => Supplier)
  supplier!: Supplier;

  @ManyToMany(() => Lot, undefined, { pivotTable: 'corrective_action_lots', owner: true })
  lots = new Collection<Lot>(this);

  @Property({ type: 'text' })
  problem!: string;

  @Property({ type: 'string', length: 10 })
  dueOn!: string;

  @Enum({ items: () => CAR_STATUSES, type: 'string' })
  status: Opt<CorrectiveActionStatus> = 'open';

  /** Optimistic lock: an edit or a step taken on a stale copy is refused with 409. */
  @Property({ type: 'integer', version: true })
  version!: Opt<number>;

  @Property({ type: 'text', nullable: true })
  containment: string | null = null;

  @Property({ type: 'text', nullable: true })
  rootCause: string | null = null;

  @Property({ type: 'text', nullable: true })
  correctiveAction: string | null = null;

  @Property({ type: 'Date', nullable: true })
  respondedAt: Date | null = null;

  /** When the supplier promises the corrective action is in place (YYYY-MM-DD). */
  @Property({ type: 'string', length: 10, nullable: true })
  promisedOn: string | null = null;

  /** `supplier link` when answered through the supplier's page, else the staff e-mail. */
  @Property({ type: 'string', length: 254, nullable: true })
  respondedBy: string | null = null;

  /** What purchasing asked for when it reopened the request (e-mailed to the supplier). */
  @Property({ type: 'text', nullable: true })
  reopenComment: string | null = null;

  @ManyToOne(() => User, { nullable: true })
  verifiedBy: User | null = null;

  @Property({ type: 'Date', nullable: true })
  verifiedAt: Date | null = null;

  /** The evidence of the fix: a note, and/or a later lot of the supplier that passed. */
  @Property({ type: 'text', nullable: true })
  verificationNote: string | null = null;

  @ManyToOne(() => Lot, { nullable: true })
  verifiedLot: Lot | null = null;

  @Property({ type: 'Date', nullable: true })
  closedAt: Date | null = null;

  @ManyToOne(() => User)
  createdBy!: User;
}
