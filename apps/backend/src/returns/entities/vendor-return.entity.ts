import {
  Collection,
  Entity,
  Enum,
  ManyToMany,
  ManyToOne,
  PrimaryKey,
  Property,
  Unique,
  type Opt,
} from '@mikro-orm/core';
import { Lot } from '../../lots/entities/lot.entity';
import { Supplier } from '../../suppliers/entities/supplier.entity';
import { User } from '../../users/entities/user.entity';

export const RETURN_STATUSES = ['draft', 'sent', 'acknowledged', 'closed'] as const;
export type ReturnStatus = (typeof RETURN_STATUSES)[number];

export interface ReturnCosts {
  inspectionHours?: number;
  hourlyRate?: number;
  freight?: number;
  other?: number;
}

/** Return to vendor (RTV) of rejected lots of one supplier. */
@Entity({ tableName: 'vendor_returns' })
export class VendorReturn {
  @PrimaryKey({ type: 'integer' })
  id!: number;

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

  @Property({ type: 'text', nullable: true })
  notes: string | null = null;

  @Enum({ items: () => RETURN_STATUSES, type: 'string' })
  status: Opt<ReturnStatus> = 'draft';

  @Property({ type: 'json' })
  costs: Opt<ReturnCosts> = {};

  /** Chargeback of sorting and inspection costs, in the shop's currency. */
  @Property({ type: 'double' })
  chargebackTotal: Opt<number> = 0;

  @ManyToOne(() => User)
  createdBy!: User;

  @Property({ type: 'Date' })
  createdAt: Opt<Date> = new Date();

  @Property({ type: 'Date', onUpdate: () => new Date() })
  updatedAt: Opt<Date> = new Date();
}
