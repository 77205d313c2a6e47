import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@/components/data-table/data-table';
import { api } from '@/lib/api-client';

/** What the product form needs of a supplier. */
export interface SupplierOption {
  id: number;
  name: string;
  code: string;
  status: 'approved' | 'probation' | 'suspended';
}

// Under the suppliers key, so any supplier change refreshes the choices too.
export const supplierOptionsKey = ['suppliers', 'options'] as const;

/** The first 100 suppliers by name (the API's largest page): enough for a choice list. */
export const getSupplierOptions = (signal?: AbortSignal) =>
  api.get<Page<SupplierOption>>('/suppliers?pageSize=100&sort=name:asc', signal);

export const supplierOptionsQueryOptions = () =>
  queryOptions({
    queryKey: supplierOptionsKey,
    queryFn: ({ signal }) => getSupplierOptions(signal),
    select: (page) => page.items,
  });

export const useSupplierOptions = () => useQuery(supplierOptionsQueryOptions());
