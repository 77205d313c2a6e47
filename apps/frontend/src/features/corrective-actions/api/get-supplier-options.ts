import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page } from '@/features/corrective-actions/types';

export interface SupplierOption {
  id: number;
  name: string;
  code: string;
}

const params = { pageSize: 100, sort: 'name:asc' };

// The suppliers screen's layered key for the same request, so its edits refresh this list.
export const supplierOptionsQueryOptions = () =>
  queryOptions({
    queryKey: ['suppliers', 'list', params] as const,
    queryFn: ({ signal }) =>
      api.get<Page<SupplierOption>>('/suppliers?pageSize=100&sort=name:asc', signal),
  });

export const useSupplierOptions = () => useQuery(supplierOptionsQueryOptions());
