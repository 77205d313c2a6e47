import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { PAGE_SIZE, type Page } from '@gaugeproof/api-types';
import type { MessageStatus, OutboundMessage } from '@/features/messages/types';
import { queryKeys } from '@/lib/query-keys';

export interface RelatedRecord {
  /** e.g. 'vendor_return' */
  relatedType: string;
  relatedId: number;
}

/** Which messages: those about one record, or all of them (the Messages screen). */
export interface MessagesQuery {
  related?: RelatedRecord;
  status?: MessageStatus | '';
}

export function getMessages(q: MessagesQuery, signal?: AbortSignal) {
  const params = new URLSearchParams({ pageSize: String(PAGE_SIZE.max) });
  if (q.related) {
    params.set('relatedType', q.related.relatedType);
    params.set('relatedId', String(q.related.relatedId));
  }
  if (q.status) params.set('status', q.status);
  return api.get<Page<OutboundMessage>>(`/messages?${params.toString()}`, signal);
}

export const messagesQueryOptions = (q: MessagesQuery) =>
  queryOptions({
    queryKey: queryKeys.messages.list(q),
    queryFn: ({ signal }) => getMessages(q, signal),
    // The queue retries on its own: keep the list fresh while it is open.
    refetchInterval: 15_000,
  });

export const useMessages = (q: MessagesQuery) => useQuery(messagesQueryOptions(q));
