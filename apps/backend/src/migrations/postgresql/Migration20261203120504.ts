import { Migration } from '@mikro-orm/migrations';

/**
 * Issue 13: instruments gain their stated accuracy and calibration uncertainty, metric
 * conductor specs their IEC 60228 class, readings the four-wire flag and the clerk's
 * confirmation of an unusual reading.
 */
export class Migration20261203120504 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "instruments" add column "accuracy_percent_of_reading" double precision null, add column "accuracy_absolute" double precision null, add column "calibration_uncertainty" double precision null;`,
    );
    this.addSql(`alter table "conductor_specs" add column "conductor_class" int null;`);
    this.addSql(
      `alter table "readings" add column "four_wire" boolean null, add column "confirmed_unusual" boolean not null default false;`,
    );
    // Metric conductors already registered take the default class 5 (issue 13).
    this.addSql(`update "conductor_specs" set "conductor_class" = 5 where "gauge_system" = 'metric';`);
    // Resistance readings recorded so far were four-wire (REFERENCE §4; the only form offered).
    this.addSql(`update "readings" set "four_wire" = true where "method" = 'resistance';`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "conductor_specs" drop column "conductor_class";`);
    this.addSql(
      `alter table "instruments" drop column "accuracy_percent_of_reading", drop column "accuracy_absolute", drop column "calibration_uncertainty";`,
    );
    this.addSql(`alter table "readings" drop column "four_wire", drop column "confirmed_unusual";`);
  }
}
