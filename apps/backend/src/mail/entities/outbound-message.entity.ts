import { Entity, Enum, PrimaryKey, Property, type Opt } from '@mikro-orm/core';

export const MESSAGE_STATUSES = ['queued', 'sent', 'failed', 'logged'] as const;
export type MessageStatus = (typeof MESSAGE_STATUSES)[number];

/** Every e-mail the product sends, with its fate; a failed one can be retried. */
@Entity({ tableName: 'outbound_messages' })
export class OutboundMessage {
  @PrimaryKey({ type: 'integer' })
  id!: number;

  @Property({ type: 'string', length: 254 })
  to!: string;

  @Property({ type: 'string', length: 300 })
  subject!: string;

  @Property({ type: 'text' })
  body!: string;

  /** File names and kinds of what was attached; the files are rebuilt on retry. */
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

  @Property({ type: 'Date' })
  createdAt: Opt<Date> = new Date();

  @Property({ type: 'Date', nullable: true })
  sentAt: Date | null = null;
}
