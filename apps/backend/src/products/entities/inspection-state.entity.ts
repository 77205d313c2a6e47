import { Entity, OneToOne, Property, type Opt } from '@mikro-orm/core';
import { clock } from '../../common/clock';
import { Product } from './product.entity';
import { IdEntity } from '../../common/base-entities';

/** ISO 2859-1 switching state of one supplier's product (a product has one supplier). */
@Entity({ tableName: 'inspection_states' })
export class InspectionState extends IdEntity {
  @OneToOne(() => Product, { owner: true, unique: true })
  product!: Product;

  /** normal | tightened | reduced | discontinued, mirrored from `state` for queries. */
  @Property({ type: 'string', length: 16 })
  severity: Opt<string> = 'normal';

  /** Plain JSON state from the standards library's switching rules. */
  @Property({ type: 'json' })
  state!: Record<string, unknown>;

  /** Why the state last changed, in words for the QA lead. */
  @Property({ type: 'text', nullable: true })
  reason: string | null = null;

  @Property({ type: 'Date', onUpdate: () => clock.now() })
  updatedAt: Opt<Date> = clock.now();
}
