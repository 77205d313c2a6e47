import { Entity, Enum, Index, ManyToOne, Property, type Opt } from '@mikro-orm/core';
import { clock } from '../../common/clock';
import { Lot } from '../../lots/entities/lot.entity';
import { User } from '../../users/entities/user.entity';
import { DECISION_OUTCOMES, type DecisionOutcome } from '@gaugeproof/api-types';
import { IdEntity } from '../../common/base-entities';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { DECISION_OUTCOMES, type DecisionOutcome };

/** Append-only: a later decision supersedes an earlier one, never edits it. */
@Entity({ tableName: 'decisions' })
@Index({ properties: ['lot', 'decidedAt'] })
export class Decision extends IdEntity {
  @ManyToOne(() => Lot)
  lot!: Lot;

  @Enum({ items: () => DECISION_OUTCOMES, type: 'string' })
  outcome!: DecisionOutcome;

  /** What the evaluation recommended when the decision was taken. */
  @Property({ type: 'string', length: 16 })
  recommendation!: string;

  @Property({ type: 'text' })
  reason!: string;

  /** Snapshot of the evaluation counts the decision was taken on. */
  @Property({ type: 'json' })
  evaluation!: Record<string, unknown>;

  /** The lot version the decision was taken against. */
  @Property({ type: 'integer' })
  lotVersion!: number;

  @ManyToOne(() => User)
  decidedBy!: User;

  @Property({ type: 'Date' })
  decidedAt: Opt<Date> = clock.now();
}
