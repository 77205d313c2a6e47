import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { OutboundMessage } from '@/features/messages/types';
import { queryKeys } from '@/lib/query-keys';

export const retryMessage = (id: number) => api.post<OutboundMessage>(`/messages/${id}/retry`);

export function useRetryMessage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryMessage,
    onSettled: () => queryClient.invalidateQueries({ queryKey: queryKeys.messages.all }),
  });
}
