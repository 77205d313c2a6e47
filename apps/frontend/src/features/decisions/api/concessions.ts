import type { Concession, ConcessionsAwaitingApproval } from '@gaugeproof/api-types';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

/** A concession as GET /api/lots/:id/concessions lists it (newest first): the contract's shape. */
export type { Concession };

/** GET /api/concessions/awaiting-approval: pending concessions the caller may approve. */
export type AwaitingConcession = ConcessionsAwaitingApproval['items'][number];

export const useConcessionsAwaitingApproval = () =>
  useQuery({
    queryKey: queryKeys.lots.awaitingApproval(),
    queryFn: ({ signal }) =>
      api.get<ConcessionsAwaitingApproval>('/concessions/awaiting-approval', signal),
  });

export const lotConcessionsQueryOptions = (lotId: number) =>
  queryOptions({
    queryKey: queryKeys.lots.concessions(lotId),
    queryFn: ({ signal }) => api.get<Concession[]>(`/lots/${lotId}/concessions`, signal),
  });

export const useLotConcessions = (lotId: number) => useQuery(lotConcessionsQueryOptions(lotId));

/** Approve or refuse a pending concession; the lot, its lists and Today change with it. */
export function useReviewConcession(action: 'approve' | 'refuse') {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, version, note }: { id: number; version: number; note?: string }) =>
      api.post<unknown>(`/concessions/${id}/${action}`, {
        version,
        note: note?.trim() || undefined,
      }),
    meta: { inlineErrors: true },
    onSettled: () => client.invalidateQueries({ queryKey: queryKeys.lots.all }),
  });
}
