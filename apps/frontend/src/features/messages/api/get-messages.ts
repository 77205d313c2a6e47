import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { OutboundMessage, Page } from '@/features/messages/types';

export interface RelatedRecord {
  /** e.g. 'vendor_return' */
  relatedType: string;
  relatedId: number;
}

export const messagesKeys = {
  all: ['messages'] as const,
  related: (r: RelatedRecord) => [...messagesKeys.all, 'list', r] as const,
};

export const getMessages = (r: RelatedRecord, signal?: AbortSignal) =>
  api.get<Page<OutboundMessage>>(
    `/messages?relatedType=${encodeURIComponent(r.relatedType)}&relatedId=${r.relatedId}&pageSize=100`,
    signal,
  );

export const messagesQueryOptions = (r: RelatedRecord) =>
  queryOptions({
    queryKey: messagesKeys.related(r),
    queryFn: ({ signal }) => getMessages(r, signal),
  });

export const useMessages = (r: RelatedRecord) => useQuery(messagesQueryOptions(r));
