import { Migration } from '@mikro-orm/migrations';

const COLUMNS =
  '`id`, `lot_id`, `sample_id`, `caption`, `storage_key`, `thumbnail_key`, `mime_type`, `size_bytes`, `sha256`, `width`, `height`, `uploaded_by_id`, `created_at`';

/**
 * Issue 15: a photo is voided with a reason, by whom and when, never deleted. SQLite adds
 * a column with a foreign key only inline, so the table is built anew as the entities
 * describe it (no table refers to photos) and its rows copied over, ids kept.
 */
export class Migration20261203153110 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `photos` rename to `photos__before_void`;');
    this.addSql(
      'create table `photos` (`id` integer not null primary key autoincrement, `lot_id` integer not null, `sample_id` integer null, `caption` text null, `storage_key` text not null, `thumbnail_key` text not null, `mime_type` text not null, `size_bytes` integer not null, `sha256` text not null, `width` integer not null, `height` integer not null, `uploaded_by_id` integer not null, `created_at` datetime not null, `voided` integer not null default false, `void_reason` text null, `voided_by_id` integer null, `voided_at` datetime null, constraint `photos_lot_id_foreign` foreign key(`lot_id`) references `lots`(`id`) on update cascade, constraint `photos_sample_id_foreign` foreign key(`sample_id`) references `samples`(`id`) on delete set null on update cascade, constraint `photos_uploaded_by_id_foreign` foreign key(`uploaded_by_id`) references `users`(`id`) on update cascade, constraint `photos_voided_by_id_foreign` foreign key(`voided_by_id`) references `users`(`id`) on delete set null on update cascade);',
    );
    this.addSql(`insert into \`photos\` (${COLUMNS}) select ${COLUMNS} from \`photos__before_void\`;`);
    this.addSql('drop table `photos__before_void`;');
    this.addSql('create index `photos_lot_id_index` on `photos` (`lot_id`);');
    this.addSql('create index `photos_sample_id_index` on `photos` (`sample_id`);');
    this.addSql('create index `photos_uploaded_by_id_index` on `photos` (`uploaded_by_id`);');
    this.addSql('create index `photos_voided_by_id_index` on `photos` (`voided_by_id`);');
  }

  override async down(): Promise<void> {
    this.addSql('drop index `photos_voided_by_id_index`;');
    this.addSql('alter table `photos` drop column `voided_at`;');
    this.addSql('alter table `photos` drop column `voided_by_id`;');
    this.addSql('alter table `photos` drop column `void_reason`;');
    this.addSql('alter table `photos` drop column `voided`;');
  }
}
