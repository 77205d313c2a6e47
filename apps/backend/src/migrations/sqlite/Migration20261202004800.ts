import { Migration } from '@mikro-orm/migrations';

/** Return (RTV-) and corrective-action (SCAR-) numbers are unique, as NCR numbers are. */
export class Migration20261202004800 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create unique index \`vendor_returns_number_unique\` on \`vendor_returns\` (\`number\`);`,
    );
    this.addSql(
      `create unique index \`corrective_actions_number_unique\` on \`corrective_actions\` (\`number\`);`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop index \`vendor_returns_number_unique\`;`);
    this.addSql(`drop index \`corrective_actions_number_unique\`;`);
  }
}
