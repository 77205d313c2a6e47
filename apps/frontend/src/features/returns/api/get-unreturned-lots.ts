import type { UnreturnedLots } from '@gaugeproof/api-types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

/** GET /api/returns/unreturned-lots: rejected lots on no return yet, oldest rejection first. */
export type UnreturnedLot = UnreturnedLots['items'][number];

export const unreturnedLotsQueryOptions = () =>
  queryOptions({
    // Under 'returns' and 'lots' both: a new return and a new decision refresh it.
    queryKey: queryKeys.returns.unreturnedLots(),
    queryFn: ({ signal }) => api.get<UnreturnedLots>('/returns/unreturned-lots', signal),
  });

export const useUnreturnedLots = () => useQuery(unreturnedLotsQueryOptions());
