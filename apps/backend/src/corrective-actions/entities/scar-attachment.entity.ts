import { Entity, ManyToOne, Property } from '@mikro-orm/core';
import { CorrectiveAction } from './corrective-action.entity';
import { CreatedEntity } from '../../common/base-entities';

/** A file the supplier sent with its answer (PDF or image, checked by content). */
@Entity({ tableName: 'scar_attachments' })
export class ScarAttachment extends CreatedEntity {
  @ManyToOne(() => CorrectiveAction, { deleteRule: 'cascade' })
  correctiveAction!: CorrectiveAction;

  /** The supplier's file name, cleaned; the stored key is the server's own. */
  @Property({ type: 'string', length: 200 })
  filename!: string;

  @Property({ type: 'string', length: 40 })
  contentType!: string;

  @Property({ type: 'integer' })
  sizeBytes!: number;

  @Property({ type: 'string', length: 200 })
  storageKey!: string;

  /** `supplier` (through the link) or the e-mail of the staff member who added it. */
  @Property({ type: 'string', length: 254 })
  addedBy!: string;
}
