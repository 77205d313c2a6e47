import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

export interface ScarFile {
  id: number;
  filename: string;
  contentType: string;
  sizeBytes: number;
  addedBy: string;
  createdAt: string;
}

/** E-mails the supplier a signed link (30 days) to answer on its own page. */
export function useSendToSupplier(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () =>
      api.post<{ message: { status: string; to: string; error: string | null } }>(
        `/corrective-actions/${id}/send`,
        {},
      ),
    meta: { inlineErrors: true },
    onSettled: () => client.invalidateQueries({ queryKey: queryKeys.messages.all }),
  });
}

export function useRevokeLinks(id: number) {
  return useMutation({
    mutationFn: () => api.post<{ revoked: number }>(`/corrective-actions/${id}/revoke-links`),
    meta: { inlineErrors: true },
  });
}

export const useScarFiles = (id: number) =>
  useQuery({
    queryKey: queryKeys.correctiveActions.files(id),
    queryFn: ({ signal }) => api.get<ScarFile[]>(`/corrective-actions/${id}/attachments`, signal),
  });
