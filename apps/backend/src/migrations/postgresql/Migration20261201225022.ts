import { Migration } from '@mikro-orm/migrations';

export class Migration20261201225022 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "audit_events" ("id" serial primary key, "actor_id" int null, "actor_email" varchar(254) not null, "action" varchar(48) not null, "entity_type" varchar(48) not null, "entity_id" int null, "lot_id" int null, "before" jsonb null, "after" jsonb null, "at" timestamptz not null);`,
    );
    this.addSql(`create index "audit_events_action_index" on "audit_events" ("action");`);
    this.addSql(`create index "audit_events_at_index" on "audit_events" ("at");`);
    this.addSql(`create index "audit_events_lot_id_at_index" on "audit_events" ("lot_id", "at");`);
    this.addSql(
      `create index "audit_events_entity_type_entity_id_index" on "audit_events" ("entity_type", "entity_id");`,
    );

    this.addSql(
      `create table "instruments" ("id" serial primary key, "kind" text check ("kind" in ('balance', 'micrometer', 'caliper', 'length_rule', 'milliohm_meter', 'thermometer')) not null, "name" varchar(120) not null, "serial" varchar(64) not null, "resolution" double precision not null, "resolution_unit" varchar(8) not null, "calibrated_on" varchar(10) not null, "calibration_due_on" varchar(10) not null, "active" boolean not null default true, "created_at" timestamptz not null, "updated_at" timestamptz not null);`,
    );
    this.addSql(
      `alter table "instruments" add constraint "instruments_serial_unique" unique ("serial");`,
    );

    this.addSql(
      `create table "outbound_messages" ("id" serial primary key, "to" varchar(254) not null, "subject" varchar(300) not null, "body" text not null, "attachments" jsonb not null, "status" text check ("status" in ('queued', 'sent', 'failed', 'logged')) not null default 'queued', "error" text null, "attempts" int not null default 0, "related_type" varchar(48) not null, "related_id" int null, "sent_by_id" int null, "created_at" timestamptz not null, "sent_at" timestamptz null);`,
    );

    this.addSql(
      `create table "suppliers" ("id" serial primary key, "name" varchar(160) not null, "code" varchar(32) not null, "contact_email" varchar(254) null, "status" text check ("status" in ('approved', 'probation', 'suspended')) not null default 'approved', "notes" text null, "created_at" timestamptz not null, "updated_at" timestamptz not null);`,
    );
    this.addSql(`alter table "suppliers" add constraint "suppliers_code_unique" unique ("code");`);

    this.addSql(
      `create table "products" ("id" serial primary key, "supplier_id" int not null, "sku" varchar(64) not null, "kind" text check ("kind" in ('spool', 'kit')) not null, "description" varchar(300) not null, "length_per_unit_m" double precision null, "inspection_level" varchar(8) not null default 'S-3', "aql" varchar(8) not null default '1.0', "min_area_ratio" double precision not null default 0.98, "active" boolean not null default true, "created_at" timestamptz not null, "updated_at" timestamptz not null);`,
    );
    this.addSql(
      `alter table "products" add constraint "products_supplier_id_sku_unique" unique ("supplier_id", "sku");`,
    );

    this.addSql(
      `create table "inspection_states" ("id" serial primary key, "product_id" int not null, "severity" varchar(16) not null default 'normal', "state" jsonb not null, "reason" text null, "updated_at" timestamptz not null);`,
    );
    this.addSql(
      `alter table "inspection_states" add constraint "inspection_states_product_id_unique" unique ("product_id");`,
    );

    this.addSql(
      `create table "conductor_specs" ("id" serial primary key, "product_id" int not null, "position" int not null default 0, "purpose" text check ("purpose" in ('power', 'ground', 'remote', 'speaker', 'other')) not null, "gauge_label" varchar(32) not null, "gauge_system" varchar(8) not null, "nominal_area_mm2" double precision not null, "claimed_material" text check ("claimed_material" in ('copper', 'tinned_copper', 'cca10', 'cca15', 'aluminium')) not null, "claimed_strands" int null, "active" boolean not null default true);`,
    );

    this.addSql(
      `create table "users" ("id" serial primary key, "email" varchar(254) not null, "name" varchar(120) not null, "password_hash" varchar(100) not null, "role" text check ("role" in ('clerk', 'qa_lead', 'purchasing', 'admin')) not null, "active" boolean not null default true, "created_at" timestamptz not null, "updated_at" timestamptz not null);`,
    );
    this.addSql(`alter table "users" add constraint "users_email_unique" unique ("email");`);

    this.addSql(
      `create table "lots" ("id" serial primary key, "product_id" int not null, "supplier_id" int not null, "po_number" varchar(64) not null, "packing_slip" varchar(64) null, "supplier_lot_code" varchar(64) null, "quantity" int not null, "unit" varchar(16) not null, "received_at" timestamptz not null, "received_by_id" int not null, "status" text check ("status" in ('on_hold', 'inspecting', 'awaiting_decision', 'accepted', 'accepted_on_concession', 'rejected', 'returned')) not null default 'on_hold', "sampling_plan" jsonb not null, "notes" text null, "version" int not null default 1, "created_at" timestamptz not null, "updated_at" timestamptz not null);`,
    );
    this.addSql(`create index "lots_po_number_index" on "lots" ("po_number");`);
    this.addSql(
      `create index "lots_supplier_id_received_at_index" on "lots" ("supplier_id", "received_at");`,
    );
    this.addSql(
      `create index "lots_status_received_at_index" on "lots" ("status", "received_at");`,
    );

    this.addSql(
      `create table "samples" ("id" serial primary key, "lot_id" int not null, "conductor_id" int not null, "seq" int not null, "unit_ref" varchar(64) null, "created_by_id" int not null, "created_at" timestamptz not null);`,
    );

    this.addSql(
      `create table "readings" ("id" serial primary key, "sample_id" int not null, "method" text check ("method" in ('mass', 'strands', 'resistance', 'diameter')) not null, "inputs" jsonb not null, "instruments" jsonb not null, "area_mm2" double precision not null, "u_mm2" double precision not null, "expanded_umm2" double precision not null, "area_ratio" double precision not null, "measures_as" varchar(32) not null, "identified_material" varchar(16) null, "material_mismatch" boolean not null default false, "verdict" text check ("verdict" in ('conforms', 'nonconforming', 'inconclusive')) not null, "result" jsonb not null, "taken_by_id" int not null, "taken_at" timestamptz not null, "voided" boolean not null default false, "void_reason" text null, "voided_by_id" int null, "voided_at" timestamptz null);`,
    );
    this.addSql(
      `create index "readings_sample_id_voided_index" on "readings" ("sample_id", "voided");`,
    );

    this.addSql(
      `create table "photos" ("id" serial primary key, "lot_id" int not null, "sample_id" int null, "caption" varchar(300) null, "storage_key" varchar(200) not null, "thumbnail_key" varchar(200) not null, "mime_type" varchar(32) not null, "size_bytes" int not null, "sha256" varchar(64) not null, "width" int not null, "height" int not null, "uploaded_by_id" int not null, "created_at" timestamptz not null);`,
    );

    this.addSql(
      `create table "decisions" ("id" serial primary key, "lot_id" int not null, "outcome" text check ("outcome" in ('accept', 'accept_on_concession', 'reject')) not null, "recommendation" varchar(16) not null, "reason" text not null, "evaluation" jsonb not null, "lot_version" int not null, "decided_by_id" int not null, "decided_at" timestamptz not null);`,
    );
    this.addSql(
      `create index "decisions_lot_id_decided_at_index" on "decisions" ("lot_id", "decided_at");`,
    );

    this.addSql(
      `create table "nonconformances" ("id" serial primary key, "number" varchar(20) not null, "year" int not null, "seq" int not null, "lot_id" int not null, "decision_id" int not null, "disposition" varchar(24) null, "status" varchar(8) not null default 'open', "created_at" timestamptz not null);`,
    );
    this.addSql(
      `alter table "nonconformances" add constraint "nonconformances_number_unique" unique ("number");`,
    );
    this.addSql(
      `alter table "nonconformances" add constraint "nonconformances_year_seq_unique" unique ("year", "seq");`,
    );

    this.addSql(
      `create table "corrective_actions" ("id" serial primary key, "number" varchar(20) not null, "supplier_id" int not null, "problem" text not null, "due_on" varchar(10) not null, "status" text check ("status" in ('open', 'responded', 'verified', 'reopened', 'closed')) not null default 'open', "containment" text null, "root_cause" text null, "corrective_action" text null, "responded_at" timestamptz null, "closed_at" timestamptz null, "created_by_id" int not null, "created_at" timestamptz not null, "updated_at" timestamptz not null);`,
    );

    this.addSql(
      `create table "corrective_action_lots" ("corrective_action_id" int not null, "lot_id" int not null, constraint "corrective_action_lots_pkey" primary key ("corrective_action_id", "lot_id"));`,
    );

    this.addSql(
      `create table "vendor_returns" ("id" serial primary key, "number" varchar(20) not null, "supplier_id" int not null, "rma_number" varchar(64) null, "notes" text null, "status" text check ("status" in ('draft', 'sent', 'acknowledged', 'closed')) not null default 'draft', "costs" jsonb not null, "chargeback_total" double precision not null default 0, "created_by_id" int not null, "created_at" timestamptz not null, "updated_at" timestamptz not null);`,
    );

    this.addSql(
      `create table "vendor_return_lots" ("vendor_return_id" int not null, "lot_id" int not null, constraint "vendor_return_lots_pkey" primary key ("vendor_return_id", "lot_id"));`,
    );

    this.addSql(
      `alter table "products" add constraint "products_supplier_id_foreign" foreign key ("supplier_id") references "suppliers" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "inspection_states" add constraint "inspection_states_product_id_foreign" foreign key ("product_id") references "products" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "conductor_specs" add constraint "conductor_specs_product_id_foreign" foreign key ("product_id") references "products" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "lots" add constraint "lots_product_id_foreign" foreign key ("product_id") references "products" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "lots" add constraint "lots_supplier_id_foreign" foreign key ("supplier_id") references "suppliers" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "lots" add constraint "lots_received_by_id_foreign" foreign key ("received_by_id") references "users" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "samples" add constraint "samples_lot_id_foreign" foreign key ("lot_id") references "lots" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "samples" add constraint "samples_conductor_id_foreign" foreign key ("conductor_id") references "conductor_specs" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "samples" add constraint "samples_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "readings" add constraint "readings_sample_id_foreign" foreign key ("sample_id") references "samples" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "readings" add constraint "readings_taken_by_id_foreign" foreign key ("taken_by_id") references "users" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "readings" add constraint "readings_voided_by_id_foreign" foreign key ("voided_by_id") references "users" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "photos" add constraint "photos_lot_id_foreign" foreign key ("lot_id") references "lots" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "photos" add constraint "photos_sample_id_foreign" foreign key ("sample_id") references "samples" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "photos" add constraint "photos_uploaded_by_id_foreign" foreign key ("uploaded_by_id") references "users" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "decisions" add constraint "decisions_lot_id_foreign" foreign key ("lot_id") references "lots" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "decisions" add constraint "decisions_decided_by_id_foreign" foreign key ("decided_by_id") references "users" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "nonconformances" add constraint "nonconformances_lot_id_foreign" foreign key ("lot_id") references "lots" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "nonconformances" add constraint "nonconformances_decision_id_foreign" foreign key ("decision_id") references "decisions" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "corrective_actions" add constraint "corrective_actions_supplier_id_foreign" foreign key ("supplier_id") references "suppliers" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "corrective_actions" add constraint "corrective_actions_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "corrective_action_lots" add constraint "corrective_action_lots_corrective_action_id_foreign" foreign key ("corrective_action_id") references "corrective_actions" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "corrective_action_lots" add constraint "corrective_action_lots_lot_id_foreign" foreign key ("lot_id") references "lots" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table "vendor_returns" add constraint "vendor_returns_supplier_id_foreign" foreign key ("supplier_id") references "suppliers" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "vendor_returns" add constraint "vendor_returns_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "vendor_return_lots" add constraint "vendor_return_lots_vendor_return_id_foreign" foreign key ("vendor_return_id") references "vendor_returns" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "vendor_return_lots" add constraint "vendor_return_lots_lot_id_foreign" foreign key ("lot_id") references "lots" ("id") on update cascade on delete cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "products" drop constraint "products_supplier_id_foreign";`);

    this.addSql(`alter table "lots" drop constraint "lots_supplier_id_foreign";`);

    this.addSql(
      `alter table "corrective_actions" drop constraint "corrective_actions_supplier_id_foreign";`,
    );

    this.addSql(
      `alter table "vendor_returns" drop constraint "vendor_returns_supplier_id_foreign";`,
    );

    this.addSql(
      `alter table "inspection_states" drop constraint "inspection_states_product_id_foreign";`,
    );

    this.addSql(
      `alter table "conductor_specs" drop constraint "conductor_specs_product_id_foreign";`,
    );

    this.addSql(`alter table "lots" drop constraint "lots_product_id_foreign";`);

    this.addSql(`alter table "samples" drop constraint "samples_conductor_id_foreign";`);

    this.addSql(`alter table "lots" drop constraint "lots_received_by_id_foreign";`);

    this.addSql(`alter table "samples" drop constraint "samples_created_by_id_foreign";`);

    this.addSql(`alter table "readings" drop constraint "readings_taken_by_id_foreign";`);

    this.addSql(`alter table "readings" drop constraint "readings_voided_by_id_foreign";`);

    this.addSql(`alter table "photos" drop constraint "photos_uploaded_by_id_foreign";`);

    this.addSql(`alter table "decisions" drop constraint "decisions_decided_by_id_foreign";`);

    this.addSql(
      `alter table "corrective_actions" drop constraint "corrective_actions_created_by_id_foreign";`,
    );

    this.addSql(
      `alter table "vendor_returns" drop constraint "vendor_returns_created_by_id_foreign";`,
    );

    this.addSql(`alter table "samples" drop constraint "samples_lot_id_foreign";`);

    this.addSql(`alter table "photos" drop constraint "photos_lot_id_foreign";`);

    this.addSql(`alter table "decisions" drop constraint "decisions_lot_id_foreign";`);

    this.addSql(`alter table "nonconformances" drop constraint "nonconformances_lot_id_foreign";`);

    this.addSql(
      `alter table "corrective_action_lots" drop constraint "corrective_action_lots_lot_id_foreign";`,
    );

    this.addSql(
      `alter table "vendor_return_lots" drop constraint "vendor_return_lots_lot_id_foreign";`,
    );

    this.addSql(`alter table "readings" drop constraint "readings_sample_id_foreign";`);

    this.addSql(`alter table "photos" drop constraint "photos_sample_id_foreign";`);

    this.addSql(
      `alter table "nonconformances" drop constraint "nonconformances_decision_id_foreign";`,
    );

    this.addSql(
      `alter table "corrective_action_lots" drop constraint "corrective_action_lots_corrective_action_id_foreign";`,
    );

    this.addSql(
      `alter table "vendor_return_lots" drop constraint "vendor_return_lots_vendor_return_id_foreign";`,
    );

    this.addSql(`drop table if exists "audit_events" cascade;`);

    this.addSql(`drop table if exists "instruments" cascade;`);

    this.addSql(`drop table if exists "outbound_messages" cascade;`);

    this.addSql(`drop table if exists "suppliers" cascade;`);

    this.addSql(`drop table if exists "products" cascade;`);

    this.addSql(`drop table if exists "inspection_states" cascade;`);

    this.addSql(`drop table if exists "conductor_specs" cascade;`);

    this.addSql(`drop table if exists "users" cascade;`);

    this.addSql(`drop table if exists "lots" cascade;`);

    this.addSql(`drop table if exists "samples" cascade;`);

    this.addSql(`drop table if exists "readings" cascade;`);

    this.addSql(`drop table if exists "photos" cascade;`);

    this.addSql(`drop table if exists "decisions" cascade;`);

    this.addSql(`drop table if exists "nonconformances" cascade;`);

    this.addSql(`drop table if exists "corrective_actions" cascade;`);

    this.addSql(`drop table if exists "corrective_action_lots" cascade;`);

    this.addSql(`drop table if exists "vendor_returns" cascade;`);

    this.addSql(`drop table if exists "vendor_return_lots" cascade;`);
  }
}
