import { Migration } from '@mikro-orm/migrations';

/**
 * Issue 14: the outbound messages table becomes a durable queue (next attempt, lease,
 * last attempt) and keeps each message's Reply-To. Messages left queued go out at once.
 * Added at the end, where the entity declares them, so the stored table text matches.
 */
export class Migration20261203105427 extends Migration {
  override async up(): Promise<void> {
    this.addSql('alter table `outbound_messages` add column `reply_to` text null;');
    this.addSql('alter table `outbound_messages` add column `next_attempt_at` datetime null;');
    this.addSql('alter table `outbound_messages` add column `lease_until` datetime null;');
    this.addSql('alter table `outbound_messages` add column `last_attempt_at` datetime null;');
    this.addSql(
      "update `outbound_messages` set `next_attempt_at` = cast(strftime('%s', 'now') as integer) * 1000 where `status` = 'queued';",
    );
  }
}
