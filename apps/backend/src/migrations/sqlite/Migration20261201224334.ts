import { Migration } from '@mikro-orm/migrations';

export class Migration20261201224334 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table \`audit_events\` (\`id\` integer not null primary key autoincrement, \`actor_id\` integer null, \`actor_email\` text not null, \`action\` text not null, \`entity_type\` text not null, \`entity_id\` integer null, \`lot_id\` integer null, \`before\` json null, \`after\` json null, \`at\` datetime not null);`,
    );
    this.addSql(`create index \`audit_events_action_index\` on \`audit_events\` (\`action\`);`);
    this.addSql(`create index \`audit_events_at_index\` on \`audit_events\` (\`at\`);`);
    this.addSql(
      `create index \`audit_events_lot_id_at_index\` on \`audit_events\` (\`lot_id\`, \`at\`);`,
    );
    this.addSql(
      `create index \`audit_events_entity_type_entity_id_index\` on \`audit_events\` (\`entity_type\`, \`entity_id\`);`,
    );

    this.addSql(
      `create table \`instruments\` (\`id\` integer not null primary key autoincrement, \`kind\` text check (\`kind\` in ('balance', 'micrometer', 'caliper', 'length_rule', 'milliohm_meter', 'thermometer')) not null, \`name\` text not null, \`serial\` text not null, \`resolution\` double not null, \`resolution_unit\` text not null, \`calibrated_on\` text not null, \`calibration_due_on\` text not null, \`active\` integer not null default true, \`created_at\` datetime not null, \`updated_at\` datetime not null);`,
    );
    this.addSql(
      `create unique index \`instruments_serial_unique\` on \`instruments\` (\`serial\`);`,
    );

    this.addSql(
      `create table \`outbound_messages\` (\`id\` integer not null primary key autoincrement, \`to\` text not null, \`subject\` text not null, \`body\` text not null, \`attachments\` json not null, \`status\` text check (\`status\` in ('queued', 'sent', 'failed', 'logged')) not null default 'queued', \`error\` text null, \`attempts\` integer not null default 0, \`related_type\` text not null, \`related_id\` integer null, \`sent_by_id\` integer null, \`created_at\` datetime not null, \`sent_at\` datetime null);`,
    );

    this.addSql(
      `create table \`suppliers\` (\`id\` integer not null primary key autoincrement, \`name\` text not null, \`code\` text not null, \`contact_email\` text null, \`status\` text check (\`status\` in ('approved', 'probation', 'suspended')) not null default 'approved', \`notes\` text null, \`created_at\` datetime not null, \`updated_at\` datetime not null);`,
    );
    this.addSql(`create unique index \`suppliers_code_unique\` on \`suppliers\` (\`code\`);`);

    this.addSql(
      `create table \`products\` (\`id\` integer not null primary key autoincrement, \`supplier_id\` integer not null, \`sku\` text not null, \`kind\` text check (\`kind\` in ('spool', 'kit')) not null, \`description\` text not null, \`length_per_unit_m\` double null, \`inspection_level\` text not null default 'S-3', \`aql\` text not null default '1.0', \`min_area_ratio\` double not null default 0.98, \`active\` integer not null default true, \`created_at\` datetime not null, \`updated_at\` datetime not null, constraint \`products_supplier_id_foreign\` foreign key(\`supplier_id\`) references \`suppliers\`(\`id\`) on update cascade);`,
    );
    this.addSql(`create index \`products_supplier_id_index\` on \`products\` (\`supplier_id\`);`);
    this.addSql(
      `create unique index \`products_supplier_id_sku_unique\` on \`products\` (\`supplier_id\`, \`sku\`);`,
    );

    this.addSql(
      `create table \`inspection_states\` (\`id\` integer not null primary key autoincrement, \`product_id\` integer not null, \`severity\` text not null default 'normal', \`state\` json not null, \`reason\` text null, \`updated_at\` datetime not null, constraint \`inspection_states_product_id_foreign\` foreign key(\`product_id\`) references \`products\`(\`id\`) on update cascade);`,
    );
    this.addSql(
      `create unique index \`inspection_states_product_id_unique\` on \`inspection_states\` (\`product_id\`);`,
    );

    this.addSql(
      `create table \`conductor_specs\` (\`id\` integer not null primary key autoincrement, \`product_id\` integer not null, \`position\` integer not null default 0, \`purpose\` text check (\`purpose\` in ('power', 'ground', 'remote', 'speaker', 'other')) not null, \`gauge_label\` text not null, \`gauge_system\` text not null, \`nominal_area_mm2\` double not null, \`claimed_material\` text check (\`claimed_material\` in ('copper', 'tinned_copper', 'cca10', 'cca15', 'aluminium')) not null, \`claimed_strands\` integer null, \`active\` integer not null default true, constraint \`conductor_specs_product_id_foreign\` foreign key(\`product_id\`) references \`products\`(\`id\`) on update cascade);`,
    );
    this.addSql(
      `create index \`conductor_specs_product_id_index\` on \`conductor_specs\` (\`product_id\`);`,
    );

    this.addSql(
      `create table \`users\` (\`id\` integer not null primary key autoincrement, \`email\` text not null, \`name\` text not null, \`password_hash\` text not null, \`role\` text check (\`role\` in ('clerk', 'qa_lead', 'purchasing', 'admin')) not null, \`active\` integer not null default true, \`created_at\` datetime not null, \`updated_at\` datetime not null);`,
    );
    this.addSql(`create unique index \`users_email_unique\` on \`users\` (\`email\`);`);

    this.addSql(
      `create table \`lots\` (\`id\` integer not null primary key autoincrement, \`product_id\` integer not null, \`supplier_id\` integer not null, \`po_number\` text not null, \`packing_slip\` text null, \`supplier_lot_code\` text null, \`quantity\` integer not null, \`unit\` text not null, \`received_at\` datetime not null, \`received_by_id\` integer not null, \`status\` text check (\`status\` in ('on_hold', 'inspecting', 'awaiting_decision', 'accepted', 'accepted_on_concession', 'rejected', 'returned')) not null default 'on_hold', \`sampling_plan\` json not null, \`notes\` text null, \`version\` integer not null default 1, \`created_at\` datetime not null, \`updated_at\` datetime not null, constraint \`lots_product_id_foreign\` foreign key(\`product_id\`) references \`products\`(\`id\`) on update cascade, constraint \`lots_supplier_id_foreign\` foreign key(\`supplier_id\`) references \`suppliers\`(\`id\`) on update cascade, constraint \`lots_received_by_id_foreign\` foreign key(\`received_by_id\`) references \`users\`(\`id\`) on update cascade);`,
    );
    this.addSql(`create index \`lots_product_id_index\` on \`lots\` (\`product_id\`);`);
    this.addSql(`create index \`lots_supplier_id_index\` on \`lots\` (\`supplier_id\`);`);
    this.addSql(`create index \`lots_po_number_index\` on \`lots\` (\`po_number\`);`);
    this.addSql(`create index \`lots_received_by_id_index\` on \`lots\` (\`received_by_id\`);`);
    this.addSql(
      `create index \`lots_supplier_id_received_at_index\` on \`lots\` (\`supplier_id\`, \`received_at\`);`,
    );
    this.addSql(
      `create index \`lots_status_received_at_index\` on \`lots\` (\`status\`, \`received_at\`);`,
    );

    this.addSql(
      `create table \`samples\` (\`id\` integer not null primary key autoincrement, \`lot_id\` integer not null, \`conductor_id\` integer not null, \`seq\` integer not null, \`unit_ref\` text null, \`created_by_id\` integer not null, \`created_at\` datetime not null, constraint \`samples_lot_id_foreign\` foreign key(\`lot_id\`) references \`lots\`(\`id\`) on update cascade, constraint \`samples_conductor_id_foreign\` foreign key(\`conductor_id\`) references \`conductor_specs\`(\`id\`) on update cascade, constraint \`samples_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade);`,
    );
    this.addSql(`create index \`samples_lot_id_index\` on \`samples\` (\`lot_id\`);`);
    this.addSql(`create index \`samples_conductor_id_index\` on \`samples\` (\`conductor_id\`);`);
    this.addSql(`create index \`samples_created_by_id_index\` on \`samples\` (\`created_by_id\`);`);

    this.addSql(
      `create table \`readings\` (\`id\` integer not null primary key autoincrement, \`sample_id\` integer not null, \`method\` text check (\`method\` in ('mass', 'strands', 'resistance', 'diameter')) not null, \`inputs\` json not null, \`instruments\` json not null, \`area_mm2\` double not null, \`u_mm2\` double not null, \`expanded_umm2\` double not null, \`area_ratio\` double not null, \`measures_as\` text not null, \`identified_material\` text null, \`material_mismatch\` integer not null default false, \`verdict\` text check (\`verdict\` in ('conforms', 'nonconforming', 'inconclusive')) not null, \`result\` json not null, \`taken_by_id\` integer not null, \`taken_at\` datetime not null, \`voided\` integer not null default false, \`void_reason\` text null, \`voided_by_id\` integer null, \`voided_at\` datetime null, constraint \`readings_sample_id_foreign\` foreign key(\`sample_id\`) references \`samples\`(\`id\`) on update cascade, constraint \`readings_taken_by_id_foreign\` foreign key(\`taken_by_id\`) references \`users\`(\`id\`) on update cascade, constraint \`readings_voided_by_id_foreign\` foreign key(\`voided_by_id\`) references \`users\`(\`id\`) on delete set null on update cascade);`,
    );
    this.addSql(`create index \`readings_sample_id_index\` on \`readings\` (\`sample_id\`);`);
    this.addSql(`create index \`readings_taken_by_id_index\` on \`readings\` (\`taken_by_id\`);`);
    this.addSql(`create index \`readings_voided_by_id_index\` on \`readings\` (\`voided_by_id\`);`);
    this.addSql(
      `create index \`readings_sample_id_voided_index\` on \`readings\` (\`sample_id\`, \`voided\`);`,
    );

    this.addSql(
      `create table \`photos\` (\`id\` integer not null primary key autoincrement, \`lot_id\` integer not null, \`sample_id\` integer null, \`caption\` text null, \`storage_key\` text not null, \`thumbnail_key\` text not null, \`mime_type\` text not null, \`size_bytes\` integer not null, \`sha256\` text not null, \`width\` integer not null, \`height\` integer not null, \`uploaded_by_id\` integer not null, \`created_at\` datetime not null, constraint \`photos_lot_id_foreign\` foreign key(\`lot_id\`) references \`lots\`(\`id\`) on update cascade, constraint \`photos_sample_id_foreign\` foreign key(\`sample_id\`) references \`samples\`(\`id\`) on delete set null on update cascade, constraint \`photos_uploaded_by_id_foreign\` foreign key(\`uploaded_by_id\`) references \`users\`(\`id\`) on update cascade);`,
    );
    this.addSql(`create index \`photos_lot_id_index\` on \`photos\` (\`lot_id\`);`);
    this.addSql(`create index \`photos_sample_id_index\` on \`photos\` (\`sample_id\`);`);
    this.addSql(`create index \`photos_uploaded_by_id_index\` on \`photos\` (\`uploaded_by_id\`);`);

    this.addSql(
      `create table \`decisions\` (\`id\` integer not null primary key autoincrement, \`lot_id\` integer not null, \`outcome\` text check (\`outcome\` in ('accept', 'accept_on_concession', 'reject')) not null, \`recommendation\` text not null, \`reason\` text not null, \`evaluation\` json not null, \`lot_version\` integer not null, \`decided_by_id\` integer not null, \`decided_at\` datetime not null, constraint \`decisions_lot_id_foreign\` foreign key(\`lot_id\`) references \`lots\`(\`id\`) on update cascade, constraint \`decisions_decided_by_id_foreign\` foreign key(\`decided_by_id\`) references \`users\`(\`id\`) on update cascade);`,
    );
    this.addSql(`create index \`decisions_lot_id_index\` on \`decisions\` (\`lot_id\`);`);
    this.addSql(
      `create index \`decisions_decided_by_id_index\` on \`decisions\` (\`decided_by_id\`);`,
    );
    this.addSql(
      `create index \`decisions_lot_id_decided_at_index\` on \`decisions\` (\`lot_id\`, \`decided_at\`);`,
    );

    this.addSql(
      `create table \`nonconformances\` (\`id\` integer not null primary key autoincrement, \`number\` text not null, \`year\` integer not null, \`seq\` integer not null, \`lot_id\` integer not null, \`decision_id\` integer not null, \`disposition\` text null, \`status\` text not null default 'open', \`created_at\` datetime not null, constraint \`nonconformances_lot_id_foreign\` foreign key(\`lot_id\`) references \`lots\`(\`id\`) on update cascade, constraint \`nonconformances_decision_id_foreign\` foreign key(\`decision_id\`) references \`decisions\`(\`id\`) on update cascade);`,
    );
    this.addSql(
      `create unique index \`nonconformances_number_unique\` on \`nonconformances\` (\`number\`);`,
    );
    this.addSql(
      `create index \`nonconformances_lot_id_index\` on \`nonconformances\` (\`lot_id\`);`,
    );
    this.addSql(
      `create index \`nonconformances_decision_id_index\` on \`nonconformances\` (\`decision_id\`);`,
    );
    this.addSql(
      `create unique index \`nonconformances_year_seq_unique\` on \`nonconformances\` (\`year\`, \`seq\`);`,
    );

    this.addSql(
      `create table \`corrective_actions\` (\`id\` integer not null primary key autoincrement, \`number\` text not null, \`supplier_id\` integer not null, \`problem\` text not null, \`due_on\` text not null, \`status\` text check (\`status\` in ('open', 'responded', 'verified', 'reopened', 'closed')) not null default 'open', \`containment\` text null, \`root_cause\` text null, \`corrective_action\` text null, \`responded_at\` datetime null, \`closed_at\` datetime null, \`created_by_id\` integer not null, \`created_at\` datetime not null, \`updated_at\` datetime not null, constraint \`corrective_actions_supplier_id_foreign\` foreign key(\`supplier_id\`) references \`suppliers\`(\`id\`) on update cascade, constraint \`corrective_actions_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade);`,
    );
    this.addSql(
      `create index \`corrective_actions_supplier_id_index\` on \`corrective_actions\` (\`supplier_id\`);`,
    );
    this.addSql(
      `create index \`corrective_actions_created_by_id_index\` on \`corrective_actions\` (\`created_by_id\`);`,
    );

    this.addSql(
      `create table \`corrective_action_lots\` (\`corrective_action_id\` integer not null, \`lot_id\` integer not null, constraint \`corrective_action_lots_corrective_action_id_foreign\` foreign key(\`corrective_action_id\`) references \`corrective_actions\`(\`id\`) on delete cascade on update cascade, constraint \`corrective_action_lots_lot_id_foreign\` foreign key(\`lot_id\`) references \`lots\`(\`id\`) on delete cascade on update cascade, primary key (\`corrective_action_id\`, \`lot_id\`));`,
    );
    this.addSql(
      `create index \`corrective_action_lots_corrective_action_id_index\` on \`corrective_action_lots\` (\`corrective_action_id\`);`,
    );
    this.addSql(
      `create index \`corrective_action_lots_lot_id_index\` on \`corrective_action_lots\` (\`lot_id\`);`,
    );

    this.addSql(
      `create table \`vendor_returns\` (\`id\` integer not null primary key autoincrement, \`number\` text not null, \`supplier_id\` integer not null, \`rma_number\` text null, \`notes\` text null, \`status\` text check (\`status\` in ('draft', 'sent', 'acknowledged', 'closed')) not null default 'draft', \`costs\` json not null, \`chargeback_total\` double not null default 0, \`created_by_id\` integer not null, \`created_at\` datetime not null, \`updated_at\` datetime not null, constraint \`vendor_returns_supplier_id_foreign\` foreign key(\`supplier_id\`) references \`suppliers\`(\`id\`) on update cascade, constraint \`vendor_returns_created_by_id_foreign\` foreign key(\`created_by_id\`) references \`users\`(\`id\`) on update cascade);`,
    );
    this.addSql(
      `create index \`vendor_returns_supplier_id_index\` on \`vendor_returns\` (\`supplier_id\`);`,
    );
    this.addSql(
      `create index \`vendor_returns_created_by_id_index\` on \`vendor_returns\` (\`created_by_id\`);`,
    );

    this.addSql(
      `create table \`vendor_return_lots\` (\`vendor_return_id\` integer not null, \`lot_id\` integer not null, constraint \`vendor_return_lots_vendor_return_id_foreign\` foreign key(\`vendor_return_id\`) references \`vendor_returns\`(\`id\`) on delete cascade on update cascade, constraint \`vendor_return_lots_lot_id_foreign\` foreign key(\`lot_id\`) references \`lots\`(\`id\`) on delete cascade on update cascade, primary key (\`vendor_return_id\`, \`lot_id\`));`,
    );
    this.addSql(
      `create index \`vendor_return_lots_vendor_return_id_index\` on \`vendor_return_lots\` (\`vendor_return_id\`);`,
    );
    this.addSql(
      `create index \`vendor_return_lots_lot_id_index\` on \`vendor_return_lots\` (\`lot_id\`);`,
    );
  }
}
