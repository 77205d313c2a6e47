import { Migration } from '@mikro-orm/migrations';

/**
 * Issue 14: staff notices (each user's switches and the day of their last digest; the
 * notices owed, once per user and event), concessions with their terms and approver, and
 * the product policy that a concession against a reject needs a second approval.
 */
export class Migration20261203143250 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      "create table `notice_settings` (`user_id` integer not null, `lot_awaits_decision` integer not null, `lot_reject_number` integer not null, `lot_rejected` integer not null, `scar_overdue` integer not null, `scar_answered` integer not null, `digest` integer not null, `digest_sent_on` text null, `updated_at` datetime not null, constraint `notice_settings_user_id_foreign` foreign key(`user_id`) references `users`(`id`) on delete cascade on update cascade, primary key (`user_id`));",
    );
    this.addSql(
      "create table `notices` (`id` integer not null primary key autoincrement, `user_id` integer not null, `kind` text not null, `key` text not null, `subject` text not null, `body` text not null, `delivery` text not null, `message_id` integer null, `created_at` datetime not null, constraint `notices_user_id_foreign` foreign key(`user_id`) references `users`(`id`) on delete cascade on update cascade);",
    );
    this.addSql('create index `notices_user_id_index` on `notices` (`user_id`);');
    this.addSql(
      'create index `notices_delivery_message_id_index` on `notices` (`delivery`, `message_id`);',
    );
    this.addSql('create unique index `notices_user_id_key_unique` on `notices` (`user_id`, `key`);');
    this.addSql(
      "create table `concessions` (`id` integer not null primary key autoincrement, `lot_id` integer not null, `status` text check (`status` in ('pending', 'approved', 'refused')) not null default 'pending', `scope` text not null, `quantity` double not null, `expires_on` text not null, `reason` text not null, `recommendation` text not null, `needs_second_approval` integer not null, `lot_version` integer not null, `requested_by_id` integer not null, `requested_at` datetime not null, `reviewed_by_id` integer null, `reviewed_at` datetime null, `review_note` text null, `decision_id` integer null, `version` integer not null default 1, constraint `concessions_lot_id_foreign` foreign key(`lot_id`) references `lots`(`id`) on update cascade, constraint `concessions_requested_by_id_foreign` foreign key(`requested_by_id`) references `users`(`id`) on update cascade, constraint `concessions_reviewed_by_id_foreign` foreign key(`reviewed_by_id`) references `users`(`id`) on delete set null on update cascade, constraint `concessions_decision_id_foreign` foreign key(`decision_id`) references `decisions`(`id`) on delete set null on update cascade);",
    );
    this.addSql('create index `concessions_lot_id_index` on `concessions` (`lot_id`);');
    this.addSql(
      'create index `concessions_requested_by_id_index` on `concessions` (`requested_by_id`);',
    );
    this.addSql(
      'create index `concessions_reviewed_by_id_index` on `concessions` (`reviewed_by_id`);',
    );
    this.addSql('create index `concessions_decision_id_index` on `concessions` (`decision_id`);');
    this.addSql(
      'create index `concessions_lot_id_status_index` on `concessions` (`lot_id`, `status`);',
    );
    this.addSql(
      'alter table `products` add column `concession_needs_approval` integer not null default true;',
    );
  }

  override async down(): Promise<void> {
    this.addSql('alter table `products` drop column `concession_needs_approval`;');
    this.addSql('drop table if exists `concessions`;');
    this.addSql('drop table if exists `notices`;');
    this.addSql('drop table if exists `notice_settings`;');
  }
}
