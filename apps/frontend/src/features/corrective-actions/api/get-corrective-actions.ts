import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { toQueryString } from '@/components/data-table/use-list-params';
import { api } from '@/lib/api-client';
import type { Page } from '@gaugeproof/api-types';
import type { CorrectiveAction } from '@/features/corrective-actions/types';
import { queryKeys } from '@/lib/query-keys';

/** GET /api/corrective-actions: page, pageSize, sort, status (comma list), supplierId, overdue=true. */
export type CorrectiveActionListParams = Record<string, string>;

export const getCorrectiveActions = (params: CorrectiveActionListParams, signal?: AbortSignal) =>
  api.get<Page<CorrectiveAction>>(`/corrective-actions${toQueryString(params)}`, signal);

export const correctiveActionsQueryOptions = (params: CorrectiveActionListParams) =>
  queryOptions({
    queryKey: queryKeys.correctiveActions.list(params),
    queryFn: ({ signal }) => getCorrectiveActions(params, signal),
    placeholderData: keepPreviousData,
  });

export const useCorrectiveActions = (params: CorrectiveActionListParams) =>
  useQuery(correctiveActionsQueryOptions(params));
