import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { lotQueryString, type LotListParams } from '@/features/lots/lib/lot-query';
import type { LotSummary, Page } from '@/features/lots/types';
import { queryKeys } from '@/lib/query-keys';

export const getLots = (params: LotListParams, signal?: AbortSignal) =>
  api.get<Page<LotSummary>>(`/lots${lotQueryString(params)}`, signal);

export const lotsQueryOptions = (params: LotListParams) =>
  queryOptions({
    queryKey: queryKeys.lots.list(params),
    queryFn: ({ signal }) => getLots(params, signal),
    placeholderData: keepPreviousData,
  });

export const useLots = (params: LotListParams) => useQuery(lotsQueryOptions(params));
