import { Migration } from '@mikro-orm/migrations';

/** Accounts carry an edit version: an admin's stale edit gets 409 (issue 17 item 7). */
export class Migration20261203181500 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table \`users\` add column \`version\` integer not null default 1;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table \`users\` drop column \`version\`;`);
  }
}
