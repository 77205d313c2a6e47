import { Migration } from '@mikro-orm/migrations';

/** Issue 14: links that show a supplier one return notice (what was found, photos, evidence). */
export class Migration20261203133643 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create table "return_links" ("id" serial primary key, "token_hash" varchar(64) not null, "vendor_return_id" int not null, "sent_to" varchar(254) not null, "expires_at" timestamptz not null, "revoked_at" timestamptz null, "last_opened_at" timestamptz null, "created_by_id" int not null, "created_at" timestamptz not null);`);
    this.addSql(`alter table "return_links" add constraint "return_links_token_hash_unique" unique ("token_hash");`);

    this.addSql(`alter table "return_links" add constraint "return_links_vendor_return_id_foreign" foreign key ("vendor_return_id") references "vendor_returns" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "return_links" add constraint "return_links_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "return_links" cascade;`);
  }

}
