import { Migration } from '@mikro-orm/migrations';

/**
 * Issue 14: the supplier answers in the product. Signed links (only their SHA-256 kept),
 * the supplier's files, and on the request its promised date, who answered, the reopen
 * comment and the verification (who, when, note, later lot).
 */
export class Migration20261203114950 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "supplier_links" ("id" serial primary key, "token_hash" varchar(64) not null, "corrective_action_id" int not null, "sent_to" varchar(254) not null, "expires_at" timestamptz not null, "revoked_at" timestamptz null, "last_opened_at" timestamptz null, "created_by_id" int not null, "created_at" timestamptz not null);`);
    this.addSql(`alter table "supplier_links" add constraint "supplier_links_token_hash_unique" unique ("token_hash");`);

    this.addSql(`create table "scar_attachments" ("id" serial primary key, "corrective_action_id" int not null, "filename" varchar(200) not null, "content_type" varchar(40) not null, "size_bytes" int not null, "storage_key" varchar(200) not null, "added_by" varchar(254) not null, "created_at" timestamptz not null);`);

    this.addSql(`alter table "supplier_links" add constraint "supplier_links_corrective_action_id_foreign" foreign key ("corrective_action_id") references "corrective_actions" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "supplier_links" add constraint "supplier_links_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade;`);

    this.addSql(`alter table "scar_attachments" add constraint "scar_attachments_corrective_action_id_foreign" foreign key ("corrective_action_id") references "corrective_actions" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "corrective_actions" add column "promised_on" varchar(10) null, add column "responded_by" varchar(254) null, add column "reopen_comment" text null, add column "verified_by_id" int null, add column "verified_at" timestamptz null, add column "verification_note" text null, add column "verified_lot_id" int null;`);
    this.addSql(`alter table "corrective_actions" add constraint "corrective_actions_verified_by_id_foreign" foreign key ("verified_by_id") references "users" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "corrective_actions" add constraint "corrective_actions_verified_lot_id_foreign" foreign key ("verified_lot_id") references "lots" ("id") on update cascade on delete set null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "supplier_links" cascade;`);

    this.addSql(`drop table if exists "scar_attachments" cascade;`);

    this.addSql(`alter table "corrective_actions" drop constraint "corrective_actions_verified_by_id_foreign";`);
    this.addSql(`alter table "corrective_actions" drop constraint "corrective_actions_verified_lot_id_foreign";`);

    this.addSql(`alter table "corrective_actions" drop column "promised_on", drop column "responded_by", drop column "reopen_comment", drop column "verified_by_id", drop column "verified_at", drop column "verification_note", drop column "verified_lot_id";`);
  }

}
