import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Decision } from '@/features/decisions/types';

interface LotWithDecisions {
  id: number;
  decisions: Decision[];
}

// The same request and key as the Lot page's detail: one cache entry, read for its decisions.
export const lotDecisionsQueryOptions = (lotId: number) =>
  queryOptions({
    queryKey: ['lots', 'detail', lotId] as const,
    queryFn: ({ signal }) => api.get<LotWithDecisions>(`/lots/${lotId}`, signal),
    select: (lot: LotWithDecisions) => lot.decisions ?? [],
  });

export const useLotDecisions = (lotId: number) => useQuery(lotDecisionsQueryOptions(lotId));
