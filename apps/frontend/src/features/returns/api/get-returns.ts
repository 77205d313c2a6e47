import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { toQueryString } from '@/components/data-table/use-list-params';
import { api } from '@/lib/api-client';
import type { Page } from '@gaugeproof/api-types';
import type { VendorReturn } from '@/features/returns/types';
import { queryKeys } from '@/lib/query-keys';

/** Query parameters of GET /api/returns: page, pageSize, sort, status (comma list), supplierId. */
export type ReturnListParams = Record<string, string>;

export const getReturns = (params: ReturnListParams, signal?: AbortSignal) =>
  api.get<Page<VendorReturn>>(`/returns${toQueryString(params)}`, signal);

export const returnsQueryOptions = (params: ReturnListParams) =>
  queryOptions({
    queryKey: queryKeys.returns.list(params),
    queryFn: ({ signal }) => getReturns(params, signal),
    placeholderData: keepPreviousData,
  });

export const useReturns = (params: ReturnListParams, enabled = true) =>
  useQuery({ ...returnsQueryOptions(params), enabled });
