import { Entity, Enum, Property, type Opt } from '@mikro-orm/core';
import { MESSAGE_STATUSES, type MessageStatus } from '@gaugeproof/api-types';
import { CreatedEntity, InheritedColumns } from '../../common/base-entities';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { MESSAGE_STATUSES, type MessageStatus };

/**
 * Every e-mail the product sends, with its fate. The table is the outbound queue: a message
 * is stored before any attempt, and the queue (mail-queue.ts) sends what is due, so a
 * message outlives a crash between a failed attempt and its retry.
 */
@Entity({ tableName: 'outbound_messages' })
@InheritedColumns({ before: 'sentAt' })
export class OutboundMessage extends CreatedEntity {
  @Property({ type: 'string', length: 254 })
  to!: string;

  @Property({ type: 'string', length: 300 })
  subject!: string;

  @Property({ type: 'text' })
  body!: string;

  /** File names and kinds of what was attached; the files are rebuilt on each attempt. */
  @Property({ type: 'json' })
  attachments: Opt<{ filename: string; contentType: string }[]> = [];

  @Enum({ items: () => MESSAGE_STATUSES, type: 'string' })
  status: Opt<MessageStatus> = 'queued';

  @Property({ type: 'text', nullable: true })
  error: string | null = null;

  @Property({ type: 'integer' })
  attempts: Opt<number> = 0;

  /** What the message is about, e.g. vendor_return 3. */
  @Property({ type: 'string', length: 48 })
  relatedType!: string;

  @Property({ type: 'integer', nullable: true })
  relatedId: number | null = null;

  @Property({ type: 'integer', nullable: true })
  sentById: number | null = null;

  @Property({ type: 'Date', nullable: true })
  sentAt: Date | null = null;

  /** Where the supplier's answer goes: the signed-in buyer who sent it. */
  @Property({ type: 'string', length: 254, nullable: true })
  replyTo: string | null = null;

  /** When the queue tries it next; null when sent, logged or given up. */
  @Property({ type: 'Date', nullable: true })
  nextAttemptAt: Date | null = null;

  /** A server is sending it until then; after a crash the lease runs out and another tries. */
  @Property({ type: 'Date', nullable: true })
  leaseUntil: Date | null = null;

  @Property({ type: 'Date', nullable: true })
  lastAttemptAt: Date | null = null;
}
