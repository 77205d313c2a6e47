import type { OutboundMessage } from './entities/outbound-message.entity';

/** OutboundMessage as the API shows it (docs/api-conventions.md). */
export function messageView(m: OutboundMessage) {
  return {
    id: m.id,
    to: m.to,
    replyTo: m.replyTo,
    subject: m.subject,
    body: m.body,
    attachments: m.attachments,
    status: m.status,
    error: m.error,
    attempts: m.attempts,
    nextAttemptAt: m.nextAttemptAt,
    lastAttemptAt: m.lastAttemptAt,
    relatedType: m.relatedType,
    relatedId: m.relatedId,
    sentById: m.sentById,
    createdAt: m.createdAt,
    sentAt: m.sentAt,
  };
}
export type MessageView = ReturnType<typeof messageView>;
