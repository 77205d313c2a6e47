import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@gaugeproof/api-types';
import { toQueryString } from '@/components/data-table/use-list-params';
import { api } from '@/lib/api-client';
import type { Product } from '@/features/products/types';
import { queryKeys } from '@/lib/query-keys';

/** Query parameters of GET /api/products: page, pageSize, sort, q, supplierId, kind. */
export type ProductListParams = Record<string, string>;

export const getProducts = (params: ProductListParams, signal?: AbortSignal) =>
  api.get<Page<Product>>(`/products${toQueryString(params)}`, signal);

export const productsQueryOptions = (params: ProductListParams) =>
  queryOptions({
    queryKey: queryKeys.products.list(params),
    queryFn: ({ signal }) => getProducts(params, signal),
    placeholderData: keepPreviousData,
  });

export const useProducts = (params: ProductListParams) => useQuery(productsQueryOptions(params));
