import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@gaugeproof/api-types';
import { toQueryString } from '@/components/data-table/use-list-params';
import { api } from '@/lib/api-client';
import type { Instrument } from '@/features/instruments/types';
import { queryKeys } from '@/lib/query-keys';

/** Query parameters of GET /api/instruments: page, pageSize, sort, kind, active, dueWithinDays. */
export type InstrumentListParams = Record<string, string>;

export const getInstruments = (params: InstrumentListParams, signal?: AbortSignal) =>
  api.get<Page<Instrument>>(`/instruments${toQueryString(params)}`, signal);

export const instrumentsQueryOptions = (params: InstrumentListParams) =>
  queryOptions({
    queryKey: queryKeys.instruments.list(params),
    queryFn: ({ signal }) => getInstruments(params, signal),
    placeholderData: keepPreviousData,
  });

export const useInstruments = (params: InstrumentListParams) =>
  useQuery(instrumentsQueryOptions(params));
