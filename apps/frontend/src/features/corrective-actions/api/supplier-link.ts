import type { LinksRevoked, ScarAttachment, SupplierLinkSent } from '@gaugeproof/api-types';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

/** A file the supplier sent with its answer: the contract's shape. */
export type ScarFile = ScarAttachment;

/** E-mails the supplier a signed link (30 days) to answer on its own page. */
export function useSendToSupplier(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<SupplierLinkSent>(`/corrective-actions/${id}/send`, {}),
    meta: { inlineErrors: true },
    onSettled: () => client.invalidateQueries({ queryKey: queryKeys.messages.all }),
  });
}

export function useRevokeLinks(id: number) {
  return useMutation({
    mutationFn: () => api.post<LinksRevoked>(`/corrective-actions/${id}/revoke-links`),
    meta: { inlineErrors: true },
  });
}

export const useScarFiles = (id: number) =>
  useQuery({
    queryKey: queryKeys.correctiveActions.files(id),
    queryFn: ({ signal }) => api.get<ScarFile[]>(`/corrective-actions/${id}/attachments`, signal),
  });
