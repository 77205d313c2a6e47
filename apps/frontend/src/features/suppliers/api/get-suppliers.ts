import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@gaugeproof/api-types';
import { toQueryString } from '@/components/data-table/use-list-params';
import { api } from '@/lib/api-client';
import type { Supplier } from '@/features/suppliers/types';
import { queryKeys } from '@/lib/query-keys';

/** Query parameters of GET /api/suppliers: page, pageSize, sort, q, status. */
export type SupplierListParams = Record<string, string>;

export const getSuppliers = (params: SupplierListParams, signal?: AbortSignal) =>
  api.get<Page<Supplier>>(`/suppliers${toQueryString(params)}`, signal);

export const suppliersQueryOptions = (params: SupplierListParams) =>
  queryOptions({
    queryKey: queryKeys.suppliers.list(params),
    queryFn: ({ signal }) => getSuppliers(params, signal),
    placeholderData: keepPreviousData,
  });

export const useSuppliers = (params: SupplierListParams) => useQuery(suppliersQueryOptions(params));
