import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { TimelineEvent } from '@/features/audit/types';
import { queryKeys } from '@/lib/query-keys';

// Under ['lots'] so that whatever refreshes a lot refreshes its timeline too.
export const getLotTimeline = (lotId: number, signal?: AbortSignal) =>
  api.get<TimelineEvent[]>(`/lots/${lotId}/timeline`, signal);

export const lotTimelineQueryOptions = (lotId: number) =>
  queryOptions({
    queryKey: queryKeys.lots.timeline(lotId),
    queryFn: ({ signal }) => getLotTimeline(lotId, signal),
  });

export const useLotTimeline = (lotId: number) => useQuery(lotTimelineQueryOptions(lotId));
