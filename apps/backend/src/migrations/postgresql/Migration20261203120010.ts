import { Migration } from '@mikro-orm/migrations';

/**
 * Issue 15: `client_keys` keeps the UUID a client made for a reading or a sample (bench
 * mode's offline queue) with the record it made, so a repeated request gets that record.
 */
export class Migration20261203120010 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "client_keys" ("client_id" varchar(36) not null, "kind" varchar(16) not null, "record_id" int not null, "created_at" timestamptz not null, constraint "client_keys_pkey" primary key ("client_id"));`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "client_keys";`);
  }
}
