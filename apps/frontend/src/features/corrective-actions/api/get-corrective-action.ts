import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CorrectiveAction } from '@/features/corrective-actions/types';
import { queryKeys } from '@/lib/query-keys';

export const getCorrectiveAction = (id: number, signal?: AbortSignal) =>
  api.get<CorrectiveAction>(`/corrective-actions/${id}`, signal);

export const correctiveActionQueryOptions = (id: number) =>
  queryOptions({
    queryKey: queryKeys.correctiveActions.detail(id),
    queryFn: ({ signal }) => getCorrectiveAction(id, signal),
  });

export const useCorrectiveAction = (id: number) => useQuery(correctiveActionQueryOptions(id));
