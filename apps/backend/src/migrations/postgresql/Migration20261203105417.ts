import { Migration } from '@mikro-orm/migrations';

/**
 * Issue 14: the outbound messages table becomes a durable queue (next attempt, lease,
 * last attempt) and keeps each message's Reply-To. Messages left queued go out at once.
 */
export class Migration20261203105417 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "outbound_messages" add column "reply_to" varchar(254) null, add column "next_attempt_at" timestamptz null, add column "lease_until" timestamptz null, add column "last_attempt_at" timestamptz null;`);
    this.addSql(`update "outbound_messages" set "next_attempt_at" = now() where "status" = 'queued';`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "outbound_messages" drop column "reply_to", drop column "next_attempt_at", drop column "lease_until", drop column "last_attempt_at";`);
  }

}
