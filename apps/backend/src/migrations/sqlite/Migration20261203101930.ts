import { Migration } from '@mikro-orm/migrations';

const RETURNS_TABLE =
  "create table `vendor_returns` (`id` integer not null primary key autoincrement, `number` text not null, `supplier_id` integer not null, `rma_number` text null, `notes` text null, `supplier_note` text null, `share_decision_reason` integer not null default false, `status` text check (`status` in ('draft', 'emailed', 'shipped', 'acknowledged', 'credited', 'closed', 'cancelled')) not null default 'draft', `version` integer not null default 1, `costs` json not null, `chargeback_total` double not null default 0, `currency` text not null, `emailed_at` datetime null, `carrier` text null, `tracking_number` text null, `shipped_on` text null, `shipped_quantity` double null, `acknowledged_at` datetime null, `credit_note_number` text null, `credit_amount` double null, `credited_at` datetime null, `closed_at` datetime null, `cancel_reason` text null, `cancelled_at` datetime null, `created_by_id` integer not null, `created_at` datetime not null, `updated_at` datetime not null, constraint `vendor_returns_supplier_id_foreign` foreign key(`supplier_id`) references `suppliers`(`id`) on update cascade, constraint `vendor_returns_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on update cascade);";

const CARS_TABLE =
  "create table `corrective_actions` (`id` integer not null primary key autoincrement, `number` text not null, `supplier_id` integer not null, `problem` text not null, `due_on` text not null, `status` text check (`status` in ('open', 'responded', 'verified', 'reopened', 'closed')) not null default 'open', `version` integer not null default 1, `containment` text null, `root_cause` text null, `corrective_action` text null, `responded_at` datetime null, `closed_at` datetime null, `created_by_id` integer not null, `created_at` datetime not null, `updated_at` datetime not null, constraint `corrective_actions_supplier_id_foreign` foreign key(`supplier_id`) references `suppliers`(`id`) on update cascade, constraint `corrective_actions_created_by_id_foreign` foreign key(`created_by_id`) references `users`(`id`) on update cascade);";

/** The currency of returns raised before amounts had one: the server's CURRENCY, else USD. */
export function legacyCurrency(): string {
  const c = (process.env.CURRENCY ?? '').trim().toUpperCase();
  return /^[A-Z]{3}$/.test(c) ? c : 'USD';
}

/**
 * Issue 14 and issue 17 item 7: returns get separate e-mailed / shipped steps, credit,
 * cancel, currency and a version; SCARs get a version; `open_return_lots` (the lot as
 * primary key) lets the database refuse a second open return for a lot.
 *
 * Written by hand: SQLite cannot change a check constraint, and a column added with
 * ALTER TABLE would sit after the constraints, so both tables are rebuilt with exactly
 * the text the entities create (test/migrations.e2e-spec.ts compares it). Migrations run
 * in one transaction, where foreign keys cannot be switched off and a rename rewrites the
 * link tables' references; so the rows (and their link rows, which the drop deletes) are
 * copied aside, the table dropped and created anew under its own name, and the rows put
 * back. Old "sent" returns become "shipped" (the old word meant the goods had left).
 */
export class Migration20261203101930 extends Migration {
  override async up(): Promise<void> {
    // Copies first: dropping a table deletes its link rows (on delete cascade).
    this.addSql('create table `vendor_returns__copy` as select * from `vendor_returns`;');
    this.addSql('create table `vendor_return_lots__copy` as select * from `vendor_return_lots`;');
    this.addSql('drop table `vendor_returns`;');
    this.addSql(RETURNS_TABLE);
    this.addSql(
      `insert into \`vendor_returns\` (id, number, supplier_id, rma_number, notes, status, costs, chargeback_total, currency, created_by_id, created_at, updated_at) select id, number, supplier_id, rma_number, notes, case status when 'sent' then 'shipped' else status end, costs, chargeback_total, '${legacyCurrency()}', created_by_id, created_at, updated_at from \`vendor_returns__copy\`;`,
    );
    this.addSql(
      'insert into `vendor_return_lots` (vendor_return_id, lot_id) select vendor_return_id, lot_id from `vendor_return_lots__copy`;',
    );
    this.addSql('drop table `vendor_returns__copy`;');
    this.addSql('drop table `vendor_return_lots__copy`;');
    this.addSql(
      'create index `vendor_returns_supplier_id_index` on `vendor_returns` (`supplier_id`);',
    );
    this.addSql(
      'create index `vendor_returns_created_by_id_index` on `vendor_returns` (`created_by_id`);',
    );
    this.addSql(
      'create unique index `vendor_returns_number_unique` on `vendor_returns` (`number`);',
    );

    this.addSql('create table `corrective_actions__copy` as select * from `corrective_actions`;');
    this.addSql(
      'create table `corrective_action_lots__copy` as select * from `corrective_action_lots`;',
    );
    this.addSql('drop table `corrective_actions`;');
    this.addSql(CARS_TABLE);
    this.addSql(
      'insert into `corrective_actions` (id, number, supplier_id, problem, due_on, status, containment, root_cause, corrective_action, responded_at, closed_at, created_by_id, created_at, updated_at) select id, number, supplier_id, problem, due_on, status, containment, root_cause, corrective_action, responded_at, closed_at, created_by_id, created_at, updated_at from `corrective_actions__copy`;',
    );
    this.addSql(
      'insert into `corrective_action_lots` (corrective_action_id, lot_id) select corrective_action_id, lot_id from `corrective_action_lots__copy`;',
    );
    this.addSql('drop table `corrective_actions__copy`;');
    this.addSql('drop table `corrective_action_lots__copy`;');
    this.addSql(
      'create index `corrective_actions_supplier_id_index` on `corrective_actions` (`supplier_id`);',
    );
    this.addSql(
      'create index `corrective_actions_created_by_id_index` on `corrective_actions` (`created_by_id`);',
    );
    this.addSql(
      'create unique index `corrective_actions_number_unique` on `corrective_actions` (`number`);',
    );

    this.addSql(
      'create table `open_return_lots` (`lot_id` integer not null, `vendor_return_id` integer not null, constraint `open_return_lots_lot_id_foreign` foreign key(`lot_id`) references `lots`(`id`) on delete cascade on update cascade, constraint `open_return_lots_vendor_return_id_foreign` foreign key(`vendor_return_id`) references `vendor_returns`(`id`) on delete cascade on update cascade, primary key (`lot_id`));',
    );
    this.addSql('create index `open_return_lots_lot_id_index` on `open_return_lots` (`lot_id`);');
    this.addSql(
      'create index `open_return_lots_vendor_return_id_index` on `open_return_lots` (`vendor_return_id`);',
    );
    // Lots on an open return now; should old races have put a lot on two, the older keeps it.
    this.addSql(
      "insert into `open_return_lots` (`lot_id`, `vendor_return_id`) select vrl.lot_id, min(vrl.vendor_return_id) from `vendor_return_lots` vrl join `vendor_returns` vr on vr.id = vrl.vendor_return_id where vr.status in ('draft', 'emailed', 'shipped', 'acknowledged', 'credited') group by vrl.lot_id;",
    );
  }
}
