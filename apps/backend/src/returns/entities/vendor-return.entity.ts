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
import { RETURN_STATUSES, type ReturnStatus } from '@gaugeproof/api-types';
import { TimestampedEntity } from '../../common/base-entities';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { RETURN_STATUSES, type ReturnStatus };

export interface ReturnCosts {
  inspectionHours?: number;
  hourlyRate?: number;
  freight?: number;
  other?: number;
}

/** Return to vendor (RTV) of rejected lots of one supplier. */
@Entity({ tableName: 'vendor_returns' })
export class VendorReturn extends TimestampedEntity {
  @Property({ type: 'string', length: 20 })
  @Unique()
  number!: string;

  @ManyToOne(() => Supplier)
  supplier!: Supplier;

  @ManyToMany(() => Lot, undefined, { pivotTable: 'vendor_return_lots', owner: true })
  lots = new Collection<Lot>(this);

  /** The supplier's return authorization number, once given. */
  @Property({ type: 'string', length: 64, nullable: true })
  rmaNumber: string | null = null;

  /** Purchasing's own notes; never shown to the supplier. */
  @Property({ type: 'text', nullable: true })
  notes: string | null = null;

  /** What the supplier reads in the e-mail and the evidence pack about why the goods come back. */
  @Property({ type: 'text', nullable: true })
  supplierNote: string | null = null;

  /** Whether the QA lead's reason for the decision goes into the supplier's documents. */
  @Property({ type: 'boolean' })
  shareDecisionReason: Opt<boolean> = false;

  @Enum({ items: () => RETURN_STATUSES, type: 'string' })
  status: Opt<ReturnStatus> = 'draft';

  /** Optimistic lock: an edit or a step taken on a stale copy is refused with 409. */
  @Property({ type: 'integer', version: true })
  version!: Opt<number>;

  @Property({ type: 'json' })
  costs: Opt<ReturnCosts> = {};

  /** Chargeback of sorting and inspection costs, in `currency`. */
  @Property({ type: 'double' })
  chargebackTotal: Opt<number> = 0;

  /** ISO 4217 code of every amount on the return. */
  @Property({ type: 'string', length: 3 })
  currency!: string;

  @Property({ type: 'Date', nullable: true })
  emailedAt: Date | null = null;

  @Property({ type: 'string', length: 64, nullable: true })
  carrier: string | null = null;

  @Property({ type: 'string', length: 64, nullable: true })
  trackingNumber: string | null = null;

  @Property({ type: 'string', length: 10, nullable: true })
  shippedOn: string | null = null;

  /** How much went back, in the lots' unit. */
  @Property({ type: 'double', nullable: true })
  shippedQuantity: number | null = null;

  @Property({ type: 'Date', nullable: true })
  acknowledgedAt: Date | null = null;

  @Property({ type: 'string', length: 64, nullable: true })
  creditNoteNumber: string | null = null;

  @Property({ type: 'double', nullable: true })
  creditAmount: number | null = null;

  @Property({ type: 'Date', nullable: true })
  creditedAt: Date | null = null;

  @Property({ type: 'Date', nullable: true })
  closedAt: Date | null = null;

  @Property({ type: 'text', nullable: true })
  cancelReason: string | null = null;

  @Property({ type: 'Date', nullable: true })
  cancelledAt: Date | null = null;

  @ManyToOne(() => User)
  createdBy!: User;
}
