import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { LotDetail } from '@/features/inspection/types';
import { queryKeys } from '@/lib/query-keys';

export const getLot = (id: number, signal?: AbortSignal) =>
  api.get<LotDetail>(`/lots/${id}`, signal);

export const lotQueryOptions = (id: number) =>
  queryOptions({
    queryKey: queryKeys.lots.detail(id),
    queryFn: ({ signal }) => getLot(id, signal),
  });

export const useLot = (id: number) => useQuery(lotQueryOptions(id));
