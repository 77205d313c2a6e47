import { Entity, Enum, Property, Unique, type Opt } from '@mikro-orm/core';
import { SUPPLIER_STATUSES, type SupplierStatus } from '@gaugeproof/api-types';
import { TimestampedEntity, InheritedColumns } from '../../common/base-entities';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { SUPPLIER_STATUSES, type SupplierStatus };

@Entity({ tableName: 'suppliers' })
@InheritedColumns({ before: 'version' })
export class Supplier extends TimestampedEntity {
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

  /** Optimistic lock: an edit made on a stale copy is refused with 409 (issue 17 item 7). */
  @Property({ type: 'integer', version: true })
  version!: Opt<number>;
}
