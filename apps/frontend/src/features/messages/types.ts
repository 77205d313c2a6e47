/** OutboundMessage as GET /api/messages shows it. */
export type MessageStatus = 'queued' | 'sent' | 'failed' | 'logged';

export interface OutboundMessage {
  id: number;
  to: string;
  subject: string;
  body: string;
  attachments: { filename: string; contentType: string }[];
  status: MessageStatus;
  error: string | null;
  attempts: number;
  relatedType: string | null;
  relatedId: number | null;
  sentById: number | null;
  createdAt: string;
  sentAt: string | null;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
