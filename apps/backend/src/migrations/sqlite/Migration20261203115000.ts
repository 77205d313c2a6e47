import { Migration } from '@mikro-orm/migrations';

const CARS_TABLE =
  "create table `corrective_actions` (`id` integer not null primary key autoincrement, `number` text not null, `supplier_id` integer not null, `problem` text not null, `due_on` text not null, `status` text check (`status` in ('open', 'responded', 'verified', 'reopened', 'closed')) not null default 'open', `version` integer not null default 1, `containment` text null, `root_cause` text null, `corrective_action` text null, `responded_at` datetime null, `promised_on` text null, `responded_by` text null, `reopen_comment` text null, `verified_by_id` integer null, `verified_at` datetime null, `verification_note` text null, `verified_lot_id` integer null, `closed_at` datetime null, `created_by_id` integer not null, `created_at` datetime not null, `updated_at` datetime not null, constraint `corrective_actions_supplier_id_foreign` foreign key(`supplier_id`) references `suppliers`(`id`) on update cascade, constraint `corrective_actions_verified_by_id_foreign` foreign key(`verified_by_id`) references `users`(`id`) on delete set null on update cascade, constraint `corrective_actions_verified_lot_id_foreign` foreign key(`verified_lot_id`) references `lots`(`id`) on delete set null on update cascade, constraint `corrective_actions_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on update cascade);";

/**
 * Issue 14: the supplier answers in the product. Signed links (only their SHA-256 kept),
 * the supplier's files, and on the request its promised date, who answered, the reopen
 * comment and the verification (who, when, note, later lot).
 *
 * Written by hand for the reason Migration20261203101930 gives: the new foreign keys sit
 * among the table's constraints, which ALTER TABLE cannot do, so `corrective_actions` is
 * rebuilt (rows and link rows copied aside first) before the new tables refer to it.
 */
export class Migration20261203115000 extends Migration {
  override async up(): Promise<void> {
    this.addSql('create table `corrective_actions__copy` as select * from `corrective_actions`;');
    this.addSql(
      'create table `corrective_action_lots__copy` as select * from `corrective_action_lots`;',
    );
    this.addSql('drop table `corrective_actions`;');
    this.addSql(CARS_TABLE);
    this.addSql(
      'insert into `corrective_actions` (id, number, supplier_id, problem, due_on, status, version, containment, root_cause, corrective_action, responded_at, closed_at, created_by_id, created_at, updated_at) select id, number, supplier_id, problem, due_on, status, version, containment, root_cause, corrective_action, responded_at, closed_at, created_by_id, created_at, updated_at from `corrective_actions__copy`;',
    );
    this.addSql(
      'insert into `corrective_action_lots` (corrective_action_id, lot_id) select corrective_action_id, lot_id from `corrective_action_lots__copy`;',
    );
    this.addSql('drop table `corrective_actions__copy`;');
    this.addSql('drop table `corrective_action_lots__copy`;');
    this.addSql(
      'create index `corrective_actions_supplier_id_index` on `corrective_actions` (`supplier_id`);',
    );
    this.addSql(
      'create index `corrective_actions_created_by_id_index` on `corrective_actions` (`created_by_id`);',
    );
    this.addSql(
      'create unique index `corrective_actions_number_unique` on `corrective_actions` (`number`);',
    );
    this.addSql(
      'create index `corrective_actions_verified_by_id_index` on `corrective_actions` (`verified_by_id`);',
    );
    this.addSql(
      'create index `corrective_actions_verified_lot_id_index` on `corrective_actions` (`verified_lot_id`);',
    );
    this.addSql(
      "create table `supplier_links` (`id` integer not null primary key autoincrement, `token_hash` text not null, `corrective_action_id` integer not null, `sent_to` text not null, `expires_at` datetime not null, `revoked_at` datetime null, `last_opened_at` datetime null, `created_by_id` integer not null, `created_at` datetime not null, constraint `supplier_links_corrective_action_id_foreign` foreign key(`corrective_action_id`) references `corrective_actions`(`id`) on delete cascade on update cascade, constraint `supplier_links_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on update cascade);",
    );
    this.addSql(
      'create unique index `supplier_links_token_hash_unique` on `supplier_links` (`token_hash`);',
    );
    this.addSql(
      'create index `supplier_links_corrective_action_id_index` on `supplier_links` (`corrective_action_id`);',
    );
    this.addSql(
      'create index `supplier_links_created_by_id_index` on `supplier_links` (`created_by_id`);',
    );
    this.addSql(
      "create table `scar_attachments` (`id` integer not null primary key autoincrement, `corrective_action_id` integer not null, `filename` text not null, `content_type` text not null, `size_bytes` integer not null, `storage_key` text not null, `added_by` text not null, `created_at` datetime not null, constraint `scar_attachments_corrective_action_id_foreign` foreign key(`corrective_action_id`) references `corrective_actions`(`id`) on delete cascade on update cascade);",
    );
    this.addSql(
      'create index `scar_attachments_corrective_action_id_index` on `scar_attachments` (`corrective_action_id`);',
    );
  }
}
