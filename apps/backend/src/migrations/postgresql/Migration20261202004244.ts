import { Migration } from '@mikro-orm/migrations';

export class Migration20261202004244 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `alter table "corrective_actions" add constraint "corrective_actions_number_unique" unique ("number");`,
    );

    this.addSql(
      `alter table "vendor_returns" add constraint "vendor_returns_number_unique" unique ("number");`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(
      `alter table "corrective_actions" drop constraint "corrective_actions_number_unique";`,
    );

    this.addSql(`alter table "vendor_returns" drop constraint "vendor_returns_number_unique";`);
  }
}
