import { Migration } from '@mikro-orm/migrations';

/** Suppliers, products and instruments carry a version: a stale edit gets 409 (issue 17). */
export class Migration20261203152710 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`alter table "suppliers" add column "version" int not null default 1;`);
    this.addSql(`alter table "products" add column "version" int not null default 1;`);
    this.addSql(`alter table "instruments" add column "version" int not null default 1;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "instruments" drop column "version";`);
    this.addSql(`alter table "products" drop column "version";`);
    this.addSql(`alter table "suppliers" drop column "version";`);
  }
}
