import { Entity, ManyToOne } from '@mikro-orm/core';
import { CorrectiveAction } from './corrective-action.entity';
import { SignedLink } from './signed-link.entity';

/** A link that lets a supplier answer one corrective-action request. */
@Entity({ tableName: 'supplier_links' })
export class SupplierLink extends SignedLink {
  @ManyToOne(() => CorrectiveAction, { deleteRule: 'cascade' })
  correctiveAction!: CorrectiveAction;
}
