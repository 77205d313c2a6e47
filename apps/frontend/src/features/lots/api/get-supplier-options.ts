import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page } from '@gaugeproof/api-types';
import type { SupplierOption } from '@/features/lots/types';
import { queryKeys } from '@/lib/query-keys';

// Same layered key as the supplier screens use for the same request, so their edits refresh it.
export const supplierOptionsQueryOptions = (q: string) => {
  const params = { q: q.trim(), pageSize: 20 };
  return queryOptions({
    queryKey: queryKeys.suppliers.list(params),
    queryFn: ({ signal }) => {
      const search = new URLSearchParams({ pageSize: '20' });
      if (params.q) search.set('q', params.q);
      return api.get<Page<SupplierOption>>(`/suppliers?${search.toString()}`, signal);
    },
    placeholderData: keepPreviousData,
  });
};

export const useSupplierOptions = (q: string) => useQuery(supplierOptionsQueryOptions(q));
