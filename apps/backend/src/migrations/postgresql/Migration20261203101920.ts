import { Migration } from '@mikro-orm/migrations';
import { legacyCurrency } from '../sqlite/Migration20261203101930';

/**
 * Issue 14 and issue 17 item 7: returns get separate e-mailed / shipped steps, credit,
 * cancel, currency and a version; SCARs get a version; `open_return_lots` (the lot as
 * primary key) lets the database refuse a second open return for a lot. Old "sent"
 * returns become "shipped"; returns raised before amounts had a currency get CURRENCY.
 */

export class Migration20261203101920 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "open_return_lots" ("lot_id" int not null, "vendor_return_id" int not null, constraint "open_return_lots_pkey" primary key ("lot_id"));`,
    );

    this.addSql(
      `alter table "open_return_lots" add constraint "open_return_lots_lot_id_foreign" foreign key ("lot_id") references "lots" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "open_return_lots" add constraint "open_return_lots_vendor_return_id_foreign" foreign key ("vendor_return_id") references "vendor_returns" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table "vendor_returns" drop constraint if exists "vendor_returns_status_check";`,
    );

    this.addSql(`alter table "corrective_actions" add column "version" int not null default 1;`);

    this.addSql(
      `alter table "vendor_returns" add column "supplier_note" text null, add column "share_decision_reason" boolean not null default false, add column "version" int not null default 1, add column "currency" varchar(3) null, add column "emailed_at" timestamptz null, add column "carrier" varchar(64) null, add column "tracking_number" varchar(64) null, add column "shipped_on" varchar(10) null, add column "shipped_quantity" double precision null, add column "acknowledged_at" timestamptz null, add column "credit_note_number" varchar(64) null, add column "credit_amount" double precision null, add column "credited_at" timestamptz null, add column "closed_at" timestamptz null, add column "cancel_reason" text null, add column "cancelled_at" timestamptz null;`,
    );
    this.addSql(
      `update "vendor_returns" set "currency" = '${legacyCurrency()}', "status" = case "status" when 'sent' then 'shipped' else "status" end;`,
    );
    this.addSql(`alter table "vendor_returns" alter column "currency" set not null;`);
    this.addSql(
      `alter table "vendor_returns" add constraint "vendor_returns_status_check" check("status" in ('draft', 'emailed', 'shipped', 'acknowledged', 'credited', 'closed', 'cancelled'));`,
    );
    this.addSql(
      `insert into "open_return_lots" ("lot_id", "vendor_return_id") select vrl.lot_id, min(vrl.vendor_return_id) from "vendor_return_lots" vrl join "vendor_returns" vr on vr.id = vrl.vendor_return_id where vr.status in ('draft', 'emailed', 'shipped', 'acknowledged', 'credited') group by vrl.lot_id;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "open_return_lots" cascade;`);

    this.addSql(
      `alter table "vendor_returns" drop constraint if exists "vendor_returns_status_check";`,
    );

    this.addSql(`alter table "corrective_actions" drop column "version";`);

    this.addSql(
      `alter table "vendor_returns" drop column "supplier_note", drop column "share_decision_reason", drop column "version", drop column "currency", drop column "emailed_at", drop column "carrier", drop column "tracking_number", drop column "shipped_on", drop column "shipped_quantity", drop column "acknowledged_at", drop column "credit_note_number", drop column "credit_amount", drop column "credited_at", drop column "closed_at", drop column "cancel_reason", drop column "cancelled_at";`,
    );

    this.addSql(
      `alter table "vendor_returns" add constraint "vendor_returns_status_check" check("status" in ('draft', 'sent', 'acknowledged', 'closed'));`,
    );
  }
}
