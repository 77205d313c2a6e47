import { Entity, PrimaryKey, Property, type Opt } from '@mikro-orm/core';
import { clock } from '../../common/clock';

export const CLIENT_KEY_KINDS = ['reading', 'sample'] as const;
export type ClientKeyKind = (typeof CLIENT_KEY_KINDS)[number];

/**
 * A UUID a client made for a reading or a sample it sends (bench mode's offline queue),
 * kept with the id of the record it made, in the same transaction. A request repeating the
 * id is answered with that record, never a second one; the primary key makes the database
 * refuse a second row when two such requests race.
 */
@Entity({ tableName: 'client_keys' })
export class ClientKey {
  @PrimaryKey({ type: 'string', length: 36 })
  clientId!: string;

  @Property({ type: 'string', length: 16 })
  kind!: ClientKeyKind;

  @Property({ type: 'integer' })
  recordId!: number;

  @Property({ type: 'Date' })
  createdAt: Opt<Date> = clock.now();
}
