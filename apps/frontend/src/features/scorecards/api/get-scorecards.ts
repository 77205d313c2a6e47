import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { DateRange, ScorecardList } from '@/features/scorecards/types';
import { queryKeys } from '@/lib/query-keys';

export const rangeQuery = (range: DateRange) =>
  `?${new URLSearchParams({ from: range.from, to: range.to }).toString()}`;

export const getScorecards = (range: DateRange, signal?: AbortSignal) =>
  api.get<ScorecardList>(`/scorecards${rangeQuery(range)}`, signal);

export const scorecardsQueryOptions = (range: DateRange) =>
  queryOptions({
    queryKey: queryKeys.scorecards.list(range),
    queryFn: ({ signal }) => getScorecards(range, signal),
    placeholderData: keepPreviousData,
  });

export const useScorecards = (range: DateRange) => useQuery(scorecardsQueryOptions(range));
