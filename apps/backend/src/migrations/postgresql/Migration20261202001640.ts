import { Migration } from '@mikro-orm/migrations';

export class Migration20261202001640 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create index "lots_received_at_index" on "lots" ("received_at");`);

    this.addSql(`drop index "readings_sample_id_voided_index";`);

    this.addSql(
      `create index "readings_scorecard_covering_index" on "readings" ("sample_id", "voided", "verdict", "material_mismatch", "area_ratio", "measures_as");`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop index "lots_received_at_index";`);

    this.addSql(`drop index "readings_scorecard_covering_index";`);

    this.addSql(
      `create index "readings_sample_id_voided_index" on "readings" ("sample_id", "voided");`,
    );
  }
}
