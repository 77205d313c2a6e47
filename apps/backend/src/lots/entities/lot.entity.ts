import { Entity, Enum, Index, ManyToOne, Property, type Opt } from '@mikro-orm/core';
import { clock } from '../../common/clock';
import { Product } from '../../products/entities/product.entity';
import type { StoredSamplingPlan } from '../../products/sampling-plan';
import { Supplier } from '../../suppliers/entities/supplier.entity';
import { User } from '../../users/entities/user.entity';
import { LOT_STATUSES, type LotStatus } from '@gaugeproof/api-types';
import { TimestampedEntity } from '../../common/base-entities';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { LOT_STATUSES, type LotStatus };

@Entity({ tableName: 'lots' })
@Index({ properties: ['status', 'receivedAt'] })
@Index({ properties: ['supplier', 'receivedAt'] })
/** The list's default order: a page walks it newest first and stops after the page. */
@Index({ properties: ['receivedAt'] })
export class Lot extends TimestampedEntity {
  @ManyToOne(() => Product)
  product!: Product;

  /** Copied from the product so supplier filters and scorecards need no join. */
  @ManyToOne(() => Supplier)
  supplier!: Supplier;

  @Property({ type: 'string', length: 64 })
  @Index()
  poNumber!: string;

  @Property({ type: 'string', length: 64, nullable: true })
  packingSlip: string | null = null;

  @Property({ type: 'string', length: 64, nullable: true })
  supplierLotCode: string | null = null;

  @Property({ type: 'integer' })
  quantity!: number;

  /** spools, kits, metres, feet … as written on the packing slip. */
  @Property({ type: 'string', length: 16 })
  unit!: string;

  @Property({ type: 'Date' })
  receivedAt: Opt<Date> = clock.now();

  @ManyToOne(() => User)
  receivedBy!: User;

  @Enum({ items: () => LOT_STATUSES, type: 'string' })
  status: Opt<LotStatus> = 'on_hold';

  @Property({ type: 'json' })
  samplingPlan!: StoredSamplingPlan;

  @Property({ type: 'text', nullable: true })
  notes: string | null = null;

  /** Optimistic lock: a decision on a stale version is refused with 409. */
  @Property({ type: 'integer', version: true })
  version!: number;
}
