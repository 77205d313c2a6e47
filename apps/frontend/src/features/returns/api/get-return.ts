import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { returnsKeys } from '@/features/returns/api/get-returns';
import type { VendorReturn } from '@/features/returns/types';

export const getReturn = (id: number, signal?: AbortSignal) =>
  api.get<VendorReturn>(`/returns/${id}`, signal);

export const returnQueryOptions = (id: number) =>
  queryOptions({
    queryKey: returnsKeys.detail(id),
    queryFn: ({ signal }) => getReturn(id, signal),
  });

export const useReturn = (id: number) => useQuery(returnQueryOptions(id));
