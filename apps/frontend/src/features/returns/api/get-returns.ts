import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { toQueryString } from '@/components/data-table/use-list-params';
import { api } from '@/lib/api-client';
import type { Page, VendorReturn } from '@/features/returns/types';

/** Query parameters of GET /api/returns: page, pageSize, sort, status (comma list), supplierId. */
export type ReturnListParams = Record<string, string>;

export const returnsKeys = {
  all: ['returns'] as const,
  list: (params: ReturnListParams) => [...returnsKeys.all, 'list', params] as const,
  detail: (id: number) => [...returnsKeys.all, 'detail', id] as const,
};

export const getReturns = (params: ReturnListParams, signal?: AbortSignal) =>
  api.get<Page<VendorReturn>>(`/returns${toQueryString(params)}`, signal);

export const returnsQueryOptions = (params: ReturnListParams) =>
  queryOptions({
    queryKey: returnsKeys.list(params),
    queryFn: ({ signal }) => getReturns(params, signal),
    placeholderData: keepPreviousData,
  });

export const useReturns = (params: ReturnListParams, enabled = true) =>
  useQuery({ ...returnsQueryOptions(params), enabled });
