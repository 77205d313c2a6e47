import { Migration } from '@mikro-orm/migrations';

/**
 * Issue 14: staff notices (each user's switches and the day of their last digest; the
 * notices owed, once per user and event), concessions with their terms and approver, and
 * the product policy that a concession against a reject needs a second approval.
 */
export class Migration20261203143251 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create table "notice_settings" ("user_id" int not null, "lot_awaits_decision" boolean not null, "lot_reject_number" boolean not null, "lot_rejected" boolean not null, "scar_overdue" boolean not null, "scar_answered" boolean not null, "digest" boolean not null, "digest_sent_on" varchar(10) null, "updated_at" timestamptz not null, constraint "notice_settings_pkey" primary key ("user_id"));`);

    this.addSql(`create table "notices" ("id" serial primary key, "user_id" int not null, "kind" varchar(32) not null, "key" varchar(160) not null, "subject" varchar(300) not null, "body" text not null, "delivery" varchar(8) not null, "message_id" int null, "created_at" timestamptz not null);`);
    this.addSql(`create index "notices_delivery_message_id_index" on "notices" ("delivery", "message_id");`);
    this.addSql(`alter table "notices" add constraint "notices_user_id_key_unique" unique ("user_id", "key");`);

    this.addSql(`create table "concessions" ("id" serial primary key, "lot_id" int not null, "status" text check ("status" in ('pending', 'approved', 'refused')) not null default 'pending', "scope" text not null, "quantity" double precision not null, "expires_on" varchar(10) not null, "reason" text not null, "recommendation" varchar(16) not null, "needs_second_approval" boolean not null, "lot_version" int not null, "requested_by_id" int not null, "requested_at" timestamptz not null, "reviewed_by_id" int null, "reviewed_at" timestamptz null, "review_note" text null, "decision_id" int null, "version" int not null default 1);`);
    this.addSql(`create index "concessions_lot_id_status_index" on "concessions" ("lot_id", "status");`);

    this.addSql(`alter table "notice_settings" add constraint "notice_settings_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "notices" add constraint "notices_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "concessions" add constraint "concessions_lot_id_foreign" foreign key ("lot_id") references "lots" ("id") on update cascade;`);
    this.addSql(`alter table "concessions" add constraint "concessions_requested_by_id_foreign" foreign key ("requested_by_id") references "users" ("id") on update cascade;`);
    this.addSql(`alter table "concessions" add constraint "concessions_reviewed_by_id_foreign" foreign key ("reviewed_by_id") references "users" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "concessions" add constraint "concessions_decision_id_foreign" foreign key ("decision_id") references "decisions" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "products" add column "concession_needs_approval" boolean not null default true;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "notice_settings" cascade;`);

    this.addSql(`drop table if exists "notices" cascade;`);

    this.addSql(`drop table if exists "concessions" cascade;`);

    this.addSql(`alter table "products" drop column "concession_needs_approval";`);
  }

}
