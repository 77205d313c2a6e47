import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Decision } from '@/features/decisions/types';
import { queryKeys } from '@/lib/query-keys';

interface LotWithDecisions {
  id: number;
  decisions: Decision[];
}

// The same request and key as the Lot page's detail: one cache entry, read for its decisions.
export const lotDecisionsQueryOptions = (lotId: number) =>
  queryOptions({
    queryKey: queryKeys.lots.detail(lotId),
    queryFn: ({ signal }) => api.get<LotWithDecisions>(`/lots/${lotId}`, signal),
    select: (lot: LotWithDecisions) => lot.decisions ?? [],
  });

export const useLotDecisions = (lotId: number) => useQuery(lotDecisionsQueryOptions(lotId));
