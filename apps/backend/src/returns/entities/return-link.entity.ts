import { Entity, ManyToOne } from '@mikro-orm/core';
import { VendorReturn } from './vendor-return.entity';
import { SignedLink } from '../../corrective-actions/entities/signed-link.entity';

/** A link that shows a supplier one return notice (the lots, the evidence pack, photos). */
@Entity({ tableName: 'return_links' })
export class ReturnLink extends SignedLink {
  @ManyToOne(() => VendorReturn, { deleteRule: 'cascade' })
  vendorReturn!: VendorReturn;
}
