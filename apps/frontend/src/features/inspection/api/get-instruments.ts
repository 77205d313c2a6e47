import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@gaugeproof/api-types';
import { api } from '@/lib/api-client';
import type { Instrument } from '@/features/inspection/types';
import { queryKeys } from '@/lib/query-keys';

export interface InstrumentListParams {
  /** Due-soon and overdue instruments only (docs/api-conventions.md). */
  dueWithinDays?: number;
  active?: boolean;
  pageSize?: number;
}

export const getInstruments = (params: InstrumentListParams, signal?: AbortSignal) => {
  const search = new URLSearchParams();
  if (params.dueWithinDays !== undefined) search.set('dueWithinDays', String(params.dueWithinDays));
  if (params.active !== undefined) search.set('active', String(params.active));
  search.set('pageSize', String(params.pageSize ?? 100));
  return api.get<Page<Instrument>>(`/instruments?${search.toString()}`, signal);
};

export const instrumentsQueryOptions = (params: InstrumentListParams) =>
  queryOptions({
    queryKey: queryKeys.instruments.list(params),
    queryFn: ({ signal }) => getInstruments(params, signal),
  });

export const useInstruments = (params: InstrumentListParams) =>
  useQuery(instrumentsQueryOptions(params));
