import { Entity, Enum, PrimaryKey, Property, Unique, type Opt } from '@mikro-orm/core';
import { SUPPLIER_STATUSES, type SupplierStatus } from '@gaugeproof/api-types';
import { clock } from '../../common/clock';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { SUPPLIER_STATUSES, type SupplierStatus };

@Entity({ tableName: 'suppliers' })
export class Supplier {
  @PrimaryKey({ type: 'integer' })
  id!: number;

  @Property({ type: 'string', length: 160 })
  name!: string;

  @Property({ type: 'string', length: 32 })
  @Unique()
  code!: string;

  @Property({ type: 'string', length: 254, nullable: true })
  contactEmail: string | null = null;

  @Enum({ items: () => SUPPLIER_STATUSES, type: 'string' })
  status: Opt<SupplierStatus> = 'approved';

  @Property({ type: 'text', nullable: true })
  notes: string | null = null;

  @Property({ type: 'Date' })
  createdAt: Opt<Date> = clock.now();

  @Property({ type: 'Date', onUpdate: () => clock.now() })
  updatedAt: Opt<Date> = clock.now();

  /** Optimistic lock: an edit made on a stale copy is refused with 409 (issue 17 item 7). */
  @Property({ type: 'integer', version: true })
  version!: Opt<number>;
}
