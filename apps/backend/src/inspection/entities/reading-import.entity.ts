import { Entity, ManyToOne, Property, Unique, type Opt } from '@mikro-orm/core';
import { clock } from '../../common/clock';
import { Lot } from '../../lots/entities/lot.entity';
import { User } from '../../users/entities/user.entity';
import { IdEntity } from '../../common/base-entities';

/**
 * A readings CSV import that was recorded, kept so that a retry of it (the same
 * `Idempotency-Key`, or the same file when the client sent no key) is answered with this
 * answer instead of recording the readings twice. Stored in the import's own transaction.
 */
@Entity({ tableName: 'reading_imports' })
@Unique({ properties: ['lot', 'key'] })
export class ReadingImport extends IdEntity {
  @ManyToOne(() => Lot)
  lot!: Lot;

  /** The client's Idempotency-Key, or `sha256:` and the file's hash. */
  @Property({ type: 'string', length: 200 })
  key!: string;

  @Property({ type: 'string', length: 64 })
  fileSha256!: string;

  @ManyToOne(() => User)
  importedBy!: User;

  @Property({ type: 'Date' })
  importedAt: Opt<Date> = clock.now();

  /** The answer the import gave (null only inside its own transaction). */
  @Property({ type: 'json', nullable: true })
  answer: Opt<Record<string, unknown>> | null = null;
}
