import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { messagesKeys } from '@/features/messages/api/get-messages';
import type { OutboundMessage } from '@/features/messages/types';

export const retryMessage = (id: number) => api.post<OutboundMessage>(`/messages/${id}/retry`);

export function useRetryMessage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryMessage,
    onSettled: () => queryClient.invalidateQueries({ queryKey: messagesKeys.all }),
  });
}
