import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page } from '@/features/corrective-actions/types';
import { queryKeys } from '@/lib/query-keys';

export interface SupplierLot {
  id: number;
  poNumber: string;
  status: string;
  receivedAt: string;
  product: { sku: string };
}

/** The supplier's decided lots (the ones a corrective action is about), newest first. */
const DECIDED = 'rejected,accepted_on_concession,returned,accepted';

export const supplierLotsQueryOptions = (supplierId: number) =>
  queryOptions({
    queryKey: queryKeys.lots.list({ supplierId, status: DECIDED, pageSize: 100 }),
    queryFn: ({ signal }) =>
      api.get<Page<SupplierLot>>(
        `/lots?supplierId=${supplierId}&status=${DECIDED}&pageSize=100&sort=receivedAt:desc`,
        signal,
      ),
  });

export const useSupplierLots = (supplierId: number | null) =>
  useQuery({ ...supplierLotsQueryOptions(supplierId ?? 0), enabled: supplierId !== null });
