import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { VendorReturn } from '@/features/returns/types';
import { queryKeys } from '@/lib/query-keys';

export const getReturn = (id: number, signal?: AbortSignal) =>
  api.get<VendorReturn>(`/returns/${id}`, signal);

export const returnQueryOptions = (id: number) =>
  queryOptions({
    queryKey: queryKeys.returns.detail(id),
    queryFn: ({ signal }) => getReturn(id, signal),
  });

export const useReturn = (id: number) => useQuery(returnQueryOptions(id));
