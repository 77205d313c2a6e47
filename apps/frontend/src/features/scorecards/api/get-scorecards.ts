import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { DateRange, ScorecardList } from '@/features/scorecards/types';

export const scorecardsKeys = {
  all: ['scorecards'] as const,
  lists: () => [...scorecardsKeys.all, 'list'] as const,
  list: (range: DateRange) => [...scorecardsKeys.lists(), range] as const,
  details: () => [...scorecardsKeys.all, 'detail'] as const,
  detail: (supplierId: number, range: DateRange) =>
    [...scorecardsKeys.details(), supplierId, range] as const,
};

export const rangeQuery = (range: DateRange) =>
  `?${new URLSearchParams({ from: range.from, to: range.to }).toString()}`;

export const getScorecards = (range: DateRange, signal?: AbortSignal) =>
  api.get<ScorecardList>(`/scorecards${rangeQuery(range)}`, signal);

export const scorecardsQueryOptions = (range: DateRange) =>
  queryOptions({
    queryKey: scorecardsKeys.list(range),
    queryFn: ({ signal }) => getScorecards(range, signal),
    placeholderData: keepPreviousData,
  });

export const useScorecards = (range: DateRange) => useQuery(scorecardsQueryOptions(range));
