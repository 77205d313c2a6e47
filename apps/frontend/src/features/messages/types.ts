import { type MessageStatus } from '@gaugeproof/api-types';
/** OutboundMessage as GET /api/messages shows it. */
export { type MessageStatus };
export const MESSAGE_STATUSES: readonly MessageStatus[] = ['queued', 'sent', 'failed', 'logged'];

export interface OutboundMessage {
  id: number;
  to: string;
  /** The signed-in user who sent it: the supplier's answer goes there. */
  replyTo: string | null;
  subject: string;
  body: string;
  attachments: { filename: string; contentType: string }[];
  status: MessageStatus;
  /** The SMTP server's answer to the last failed attempt. */
  error: string | null;
  attempts: number;
  /** When the queue tries a failed message again; null once sent or given up. */
  nextAttemptAt: string | null;
  lastAttemptAt: string | null;
  relatedType: string | null;
  relatedId: number | null;
  sentById: number | null;
  createdAt: string;
  sentAt: string | null;
}
