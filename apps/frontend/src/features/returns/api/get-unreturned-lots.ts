import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

/** GET /api/returns/unreturned-lots: rejected lots on no return yet, oldest rejection first. */
export interface UnreturnedLot {
  id: number;
  poNumber: string;
  supplierLotCode: string | null;
  quantity: number;
  unit: string;
  receivedAt: string;
  rejectedAt: string | null;
  supplier: { id: number; name: string };
  product: { id: number; sku: string };
}

export const unreturnedLotsQueryOptions = () =>
  queryOptions({
    // Under 'returns' and 'lots' both: a new return and a new decision refresh it.
    queryKey: queryKeys.returns.unreturnedLots(),
    queryFn: ({ signal }) =>
      api.get<{ items: UnreturnedLot[]; more: boolean }>('/returns/unreturned-lots', signal),
  });

export const useUnreturnedLots = () => useQuery(unreturnedLotsQueryOptions());
