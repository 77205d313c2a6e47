import { Migration } from '@mikro-orm/migrations';

/** The tables whose writes are counted (database/change-counters.ts COUNTED_TABLES). */
const COUNTED = [
  'conductor_specs',
  'corrective_actions',
  'lots',
  'products',
  'readings',
  'samples',
  'suppliers',
  'users',
  'vendor_returns',
];

/**
 * Issue 16: change counters kept by the database. After every row inserted, changed or
 * deleted in a counted table, a trigger raises that table's counter in the same
 * transaction, whoever writes; caches key their answers by the counters. A migration that
 * rebuilds one of these tables drops its triggers with it and must create them again
 * (the server refuses to start without them).
 */
export class Migration20261203180000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      'create table `change_counters` (`table_name` text not null, `version` bigint not null default 0, primary key (`table_name`));',
    );
    for (const table of COUNTED) {
      this.addSql(`insert into \`change_counters\` (\`table_name\`) values ('${table}');`);
      for (const event of ['insert', 'update', 'delete']) {
        this.addSql(
          `create trigger \`${table}_changes_${event}\` after ${event} on \`${table}\` begin update \`change_counters\` set \`version\` = \`version\` + 1 where \`table_name\` = '${table}'; end;`,
        );
      }
    }
  }

  override async down(): Promise<void> {
    for (const table of COUNTED) {
      for (const event of ['insert', 'update', 'delete']) {
        this.addSql(`drop trigger if exists \`${table}_changes_${event}\`;`);
      }
    }
    this.addSql('drop table if exists `change_counters`;');
  }
}
