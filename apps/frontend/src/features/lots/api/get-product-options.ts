import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page } from '@gaugeproof/api-types';
import type { ProductOption } from '@/features/lots/types';
import { queryKeys } from '@/lib/query-keys';

export const productOptionsQueryOptions = (supplierId: number, q: string) => {
  const params = { supplierId, q: q.trim(), pageSize: 50 };
  return queryOptions({
    queryKey: queryKeys.products.list(params),
    queryFn: ({ signal }) => {
      const search = new URLSearchParams({ supplierId: String(params.supplierId), pageSize: '50' });
      if (params.q) search.set('q', params.q);
      return api.get<Page<ProductOption>>(`/products?${search.toString()}`, signal);
    },
    placeholderData: keepPreviousData,
  });
};

/** Products of one supplier for the receiving form; off until a supplier is chosen. */
export function useProductOptions(supplierId: number | null, q: string) {
  return useQuery({
    ...productOptionsQueryOptions(supplierId ?? 0, q),
    enabled: supplierId !== null,
  });
}
