import { Migration } from '@mikro-orm/migrations';

const KEPT =
  '`user_id`, `lot_awaits_decision`, `lot_reject_number`, `lot_rejected`, `scar_overdue`, `scar_answered`, `digest`, `digest_sent_on`, `updated_at`';

/**
 * Issue 14: a notice to whoever may approve a concession that waits for its second
 * approval. Users who saved their switches before get their role's default: on for QA
 * leads and admins (the possible approvers), off for everyone else. The table is built
 * anew as the entity describes it (the new column in its place, no default; no table
 * refers to this one) and its rows copied over.
 */
export class Migration20261203182000 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `notice_settings` rename to `notice_settings__before_concession`;');
    this.addSql(
      'create table `notice_settings` (`user_id` integer not null, `lot_awaits_decision` integer not null, `lot_reject_number` integer not null, `lot_rejected` integer not null, `scar_overdue` integer not null, `scar_answered` integer not null, `concession_awaits_approval` integer not null, `digest` integer not null, `digest_sent_on` text null, `updated_at` datetime not null, constraint `notice_settings_user_id_foreign` foreign key(`user_id`) references `users`(`id`) on delete cascade on update cascade, primary key (`user_id`));',
    );
    this.addSql(
      `insert into \`notice_settings\` (${KEPT}, \`concession_awaits_approval\`) select ${KEPT}, case when \`user_id\` in (select \`id\` from \`users\` where \`role\` in ('qa_lead', 'admin')) then 1 else 0 end from \`notice_settings__before_concession\`;`,
    );
    this.addSql('drop table `notice_settings__before_concession`;');
  }

  override async down(): Promise<void> {
    this.addSql('alter table `notice_settings` drop column `concession_awaits_approval`;');
  }
}
