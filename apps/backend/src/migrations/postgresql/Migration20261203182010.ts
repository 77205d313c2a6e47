import { Migration } from '@mikro-orm/migrations';

/**
 * Issue 14: a notice to whoever may approve a concession that waits for its second
 * approval. Users who saved their switches before get their role's default: on for QA
 * leads and admins (the possible approvers), off for everyone else.
 */
export class Migration20261203182010 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "notice_settings" add column "concession_awaits_approval" boolean not null default false;`,
    );
    this.addSql(
      `update "notice_settings" set "concession_awaits_approval" = true where "user_id" in (select "id" from "users" where "role" in ('qa_lead', 'admin'));`,
    );
    // The entity has no default: the value is always written.
    this.addSql(
      `alter table "notice_settings" alter column "concession_awaits_approval" drop default;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "notice_settings" drop column "concession_awaits_approval";`);
  }
}
