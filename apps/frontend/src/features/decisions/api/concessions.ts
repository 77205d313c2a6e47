import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

/** GET /api/lots/:id/concessions, newest first. */
export interface Concession {
  id: number;
  lotId: number;
  status: 'pending' | 'approved' | 'refused';
  scope: string;
  quantity: number;
  unit: string;
  expiresOn: string;
  expired: boolean;
  reason: string;
  recommendation: string;
  needsSecondApproval: boolean;
  requestedBy: { id: number; name: string };
  requestedAt: string;
  reviewedBy: { id: number; name: string } | null;
  reviewedAt: string | null;
  reviewNote: string | null;
  decisionId: number | null;
  version: number;
}

/** GET /api/concessions/awaiting-approval: pending concessions the caller may approve. */
export interface AwaitingConcession extends Concession {
  lot: {
    id: number;
    poNumber: string;
    supplier: { id: number; name: string };
    product: { id: number; sku: string };
  };
}

export const useConcessionsAwaitingApproval = () =>
  useQuery({
    queryKey: queryKeys.lots.awaitingApproval(),
    queryFn: ({ signal }) =>
      api.get<{ items: AwaitingConcession[] }>('/concessions/awaiting-approval', signal),
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
