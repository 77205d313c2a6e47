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
 * Issue 16: change counters kept by the database; caches key their answers by them.
 *
 * Each counted table has two triggers. `<table>_changes_noted`, after each statement,
 * notes the table in a setting local to the transaction (`gp.changed_tables`).
 * `<table>_changes_counted` is deferred to the commit: the first of them to fire raises
 * the counters of every noted table, in name order, once per transaction. Raising them at
 * the commit holds the counter rows' locks only for the commit (a long import does not
 * make every other write wait), and taking them in one order means two commits never wait
 * for each other in a circle. A statement rolled back to a savepoint takes its note with
 * it. Settings and deferred triggers are PostgreSQL's own (CREATE CONSTRAINT TRIGGER,
 * set_config with is_local true).
 */
export class Migration20261203180005 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "change_counters" ("table_name" varchar(64) not null, "version" bigint not null default 0, constraint "change_counters_pkey" primary key ("table_name"));`,
    );
    this.addSql(`create function gp_note_change() returns trigger language plpgsql as $$
declare
  noted text := coalesce(current_setting('gp.changed_tables', true), '');
begin
  if position(',' || TG_TABLE_NAME || ',' in noted) = 0 then
    perform set_config('gp.changed_tables', coalesce(nullif(noted, ''), ',') || TG_TABLE_NAME || ',', true);
  end if;
  return null;
end $$;`);
    this.addSql(`create function gp_count_changes() returns trigger language plpgsql as $$
declare
  t text;
begin
  if coalesce(current_setting('gp.changes_counted', true), '') = 'yes' then
    return null;
  end if;
  perform set_config('gp.changes_counted', 'yes', true);
  for t in
    select x from unnest(string_to_array(trim(both ',' from current_setting('gp.changed_tables', true)), ',')) as x order by x
  loop
    update change_counters set version = version + 1 where table_name = t;
  end loop;
  return null;
end $$;`);
    for (const table of COUNTED) {
      this.addSql(`insert into "change_counters" ("table_name") values ('${table}');`);
      this.addSql(
        `create trigger "${table}_changes_noted" after insert or update or delete on "${table}" for each statement execute function gp_note_change();`,
      );
      this.addSql(
        `create constraint trigger "${table}_changes_counted" after insert or update or delete on "${table}" deferrable initially deferred for each row execute function gp_count_changes();`,
      );
    }
  }

  override async down(): Promise<void> {
    for (const table of COUNTED) {
      this.addSql(`drop trigger if exists "${table}_changes_counted" on "${table}";`);
      this.addSql(`drop trigger if exists "${table}_changes_noted" on "${table}";`);
    }
    this.addSql('drop function if exists gp_count_changes();');
    this.addSql('drop function if exists gp_note_change();');
    this.addSql('drop table if exists "change_counters";');
  }
}
