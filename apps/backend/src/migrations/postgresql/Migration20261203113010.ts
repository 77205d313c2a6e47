import { Migration } from '@mikro-orm/migrations';

/** Readings CSV imports kept by lot and idempotency key, so a retried import is answered, not recorded twice. */
export class Migration20261203113010 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "reading_imports" ("id" serial primary key, "lot_id" int not null, "key" varchar(200) not null, "file_sha256" varchar(64) not null, "imported_by_id" int not null, "imported_at" timestamptz not null, "answer" jsonb null);`,
    );
    this.addSql(
      `alter table "reading_imports" add constraint "reading_imports_lot_id_key_unique" unique ("lot_id", "key");`,
    );
    this.addSql(
      `alter table "reading_imports" add constraint "reading_imports_lot_id_foreign" foreign key ("lot_id") references "lots" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "reading_imports" add constraint "reading_imports_imported_by_id_foreign" foreign key ("imported_by_id") references "users" ("id") on update cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "reading_imports" cascade;`);
  }
}
