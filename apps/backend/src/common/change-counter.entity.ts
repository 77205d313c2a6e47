import { Entity, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * How many times a table has been written, kept by the database itself: triggers on the
 * counted table raise its row in the same transaction as the write (migration
 * 20261203180000 of each driver; common/change-counters.ts reads them). Never written by
 * the application.
 */
@Entity({ tableName: 'change_counters' })
export class ChangeCounter {
  @PrimaryKey({ type: 'string', length: 64 })
  tableName!: string;

  @Property({ type: 'bigint', default: 0 })
  version!: bigint;
}
