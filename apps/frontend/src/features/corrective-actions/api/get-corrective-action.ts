import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { correctiveActionsKeys } from '@/features/corrective-actions/api/get-corrective-actions';
import type { CorrectiveAction } from '@/features/corrective-actions/types';

export const getCorrectiveAction = (id: number, signal?: AbortSignal) =>
  api.get<CorrectiveAction>(`/corrective-actions/${id}`, signal);

export const correctiveActionQueryOptions = (id: number) =>
  queryOptions({
    queryKey: correctiveActionsKeys.detail(id),
    queryFn: ({ signal }) => getCorrectiveAction(id, signal),
  });

export const useCorrectiveAction = (id: number) => useQuery(correctiveActionQueryOptions(id));
