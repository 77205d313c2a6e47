import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { toQueryString } from '@/components/data-table/use-list-params';
import { api } from '@/lib/api-client';
import type { CorrectiveAction, Page } from '@/features/corrective-actions/types';

/** GET /api/corrective-actions: page, pageSize, sort, status (comma list), supplierId, overdue=true. */
export type CorrectiveActionListParams = Record<string, string>;

export const correctiveActionsKeys = {
  all: ['corrective-actions'] as const,
  list: (params: CorrectiveActionListParams) =>
    [...correctiveActionsKeys.all, 'list', params] as const,
  detail: (id: number) => [...correctiveActionsKeys.all, 'detail', id] as const,
};

export const getCorrectiveActions = (params: CorrectiveActionListParams, signal?: AbortSignal) =>
  api.get<Page<CorrectiveAction>>(`/corrective-actions${toQueryString(params)}`, signal);

export const correctiveActionsQueryOptions = (params: CorrectiveActionListParams) =>
  queryOptions({
    queryKey: correctiveActionsKeys.list(params),
    queryFn: ({ signal }) => getCorrectiveActions(params, signal),
    placeholderData: keepPreviousData,
  });

export const useCorrectiveActions = (params: CorrectiveActionListParams) =>
  useQuery(correctiveActionsQueryOptions(params));
