import { Migration } from '@mikro-orm/migrations';

/** Users carry a session version: sign-out, password, role and deactivation end old sessions. */
export class Migration20261203114510 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "users" add column "session_version" int not null default 1;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "users" drop column "session_version";`);
  }
}
