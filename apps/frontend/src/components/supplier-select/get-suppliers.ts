import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@gaugeproof/api-types';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

/** What a supplier choice shows: name, code and standing. */
export interface SupplierChoice {
  id: number;
  name: string;
  code: string;
  status: 'approved' | 'probation' | 'suspended';
}

/** Size of one search answer: a clerk types until the supplier is among them. */
const SEARCH_PAGE = 20;

// Under the suppliers key, so any supplier change refreshes the choices too.
export const supplierSearchQueryOptions = (q: string) =>
  queryOptions({
    queryKey: queryKeys.suppliers.choices(q.trim()),
    queryFn: ({ signal }) => {
      const search = new URLSearchParams({ pageSize: String(SEARCH_PAGE), sort: 'name:asc' });
      if (q.trim()) search.set('q', q.trim());
      return api.get<Page<SupplierChoice>>(`/suppliers?${search.toString()}`, signal);
    },
    placeholderData: keepPreviousData,
  });

export const useSupplierSearch = (q: string) => useQuery(supplierSearchQueryOptions(q));

/** The chosen supplier by id (an id from the address bar or a preselected form). */
export const useSupplierChoice = (id: number | null) =>
  useQuery({
    queryKey: queryKeys.suppliers.detail(id),
    queryFn: ({ signal }) => api.get<SupplierChoice>(`/suppliers/${id}`, signal),
    enabled: id !== null,
  });
