import { Migration } from '@mikro-orm/migrations';

/** Issue 15: a photo is voided with a reason, by whom and when, never deleted. */
export class Migration20261203153113 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "photos" add column "voided" boolean not null default false, add column "void_reason" text null, add column "voided_by_id" int null, add column "voided_at" timestamptz null;`,
    );
    this.addSql(
      `alter table "photos" add constraint "photos_voided_by_id_foreign" foreign key ("voided_by_id") references "users" ("id") on update cascade on delete set null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "photos" drop constraint "photos_voided_by_id_foreign";`);
    this.addSql(
      `alter table "photos" drop column "voided", drop column "void_reason", drop column "voided_by_id", drop column "voided_at";`,
    );
  }
}
