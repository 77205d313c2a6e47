import { Migration } from '@mikro-orm/migrations';

/**
 * Issue 15: `client_keys` keeps the UUID a client made for a reading or a sample (bench
 * mode's offline queue) with the record it made, so a repeated request gets that record.
 */
export class Migration20261203120000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create table `client_keys` (`client_id` text not null, `kind` text not null, `record_id` integer not null, `created_at` datetime not null, primary key (`client_id`));',
    );
  }

  override async down(): Promise<void> {
    this.addSql('drop table if exists `client_keys`;');
  }
}
