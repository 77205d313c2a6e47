import { Entity, ManyToOne } from '@mikro-orm/core';
import { Lot } from '../../lots/entities/lot.entity';
import { VendorReturn } from './vendor-return.entity';

/**
 * One row per lot while it is on an open return (draft to credited). The lot is the
 * primary key, so the database itself refuses a second open return for a lot, however
 * many requests race (issue 17, item 7). Cancelling or closing a return deletes its rows.
 */
@Entity({ tableName: 'open_return_lots' })
export class OpenReturnLot {
  @ManyToOne(() => Lot, { primary: true, deleteRule: 'cascade' })
  lot!: Lot;

  @ManyToOne(() => VendorReturn, { deleteRule: 'cascade' })
  vendorReturn!: VendorReturn;
}
