import { Migration } from '@mikro-orm/migrations';

/** Readings CSV imports kept by lot and idempotency key, so a retried import is answered, not recorded twice. */
export class Migration20261203113000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table \`reading_imports\` (\`id\` integer not null primary key autoincrement, \`lot_id\` integer not null, \`key\` text not null, \`file_sha256\` text not null, \`imported_by_id\` integer not null, \`imported_at\` datetime not null, \`answer\` json null, constraint \`reading_imports_lot_id_foreign\` foreign key(\`lot_id\`) references \`lots\`(\`id\`) on update cascade, constraint \`reading_imports_imported_by_id_foreign\` foreign key(\`imported_by_id\`) references \`users\`(\`id\`) on update cascade);`,
    );
    this.addSql(
      `create index \`reading_imports_lot_id_index\` on \`reading_imports\` (\`lot_id\`);`,
    );
    this.addSql(
      `create index \`reading_imports_imported_by_id_index\` on \`reading_imports\` (\`imported_by_id\`);`,
    );
    this.addSql(
      `create unique index \`reading_imports_lot_id_key_unique\` on \`reading_imports\` (\`lot_id\`, \`key\`);`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists \`reading_imports\`;`);
  }
}
