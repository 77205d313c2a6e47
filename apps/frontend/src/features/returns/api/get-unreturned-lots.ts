import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

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
    queryKey: ['returns', 'lots', 'unreturned'],
    queryFn: ({ signal }) =>
      api.get<{ items: UnreturnedLot[]; more: boolean }>('/returns/unreturned-lots', signal),
  });

export const useUnreturnedLots = () => useQuery(unreturnedLotsQueryOptions());
