import { Entity, ManyToOne, Property, type Opt } from '@mikro-orm/core';
import { Sample } from '../../inspection/entities/sample.entity';
import { Lot } from '../../lots/entities/lot.entity';
import { User } from '../../users/entities/user.entity';
import { clock } from '../../common/clock';
import { VoidableEntity } from '../../users/entities/voidable-entity';

/** Never deleted: a wrong or misleading photo is voided with a reason (issue 15). */
@Entity({ tableName: 'photos' })
export class Photo extends VoidableEntity {
  @ManyToOne(() => Lot)
  lot!: Lot;

  @ManyToOne(() => Sample, { nullable: true })
  sample: Sample | null = null;

  @Property({ type: 'string', length: 300, nullable: true })
  caption: string | null = null;

  /** Generated storage key of the original; never the client's file name. */
  @Property({ type: 'string', length: 200 })
  storageKey!: string;

  @Property({ type: 'string', length: 200 })
  thumbnailKey!: string;

  @Property({ type: 'string', length: 32 })
  mimeType!: string;

  @Property({ type: 'integer' })
  sizeBytes!: number;

  @Property({ type: 'string', length: 64 })
  sha256!: string;

  @Property({ type: 'integer' })
  width!: number;

  @Property({ type: 'integer' })
  height!: number;

  @ManyToOne(() => User)
  uploadedBy!: User;

  @Property({ type: 'Date' })
  createdAt: Opt<Date> = clock.now();
}
