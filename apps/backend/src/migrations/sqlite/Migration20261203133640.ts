import { Migration } from '@mikro-orm/migrations';

/** Issue 14: links that show a supplier one return notice (what was found, photos, evidence). */
export class Migration20261203133640 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      "create table `return_links` (`id` integer not null primary key autoincrement, `token_hash` text not null, `vendor_return_id` integer not null, `sent_to` text not null, `expires_at` datetime not null, `revoked_at` datetime null, `last_opened_at` datetime null, `created_by_id` integer not null, `created_at` datetime not null, constraint `return_links_vendor_return_id_foreign` foreign key(`vendor_return_id`) references `vendor_returns`(`id`) on delete cascade on update cascade, constraint `return_links_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on update cascade);",
    );
    this.addSql(
      'create unique index `return_links_token_hash_unique` on `return_links` (`token_hash`);',
    );
    this.addSql(
      'create index `return_links_vendor_return_id_index` on `return_links` (`vendor_return_id`);',
    );
    this.addSql(
      'create index `return_links_created_by_id_index` on `return_links` (`created_by_id`);',
    );
  }

  override async down(): Promise<void> {
    this.addSql('drop table if exists `return_links`;');
  }
}
