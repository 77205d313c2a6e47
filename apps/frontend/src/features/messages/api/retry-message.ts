import { api } from '@/lib/api-client';
import type { OutboundMessage } from '@/features/messages/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';

export const retryMessage = (id: number) => api.post<OutboundMessage>(`/messages/${id}/retry`);

export function useRetryMessage() {
  return useWriteMutation(retryMessage, {
    refresh: [queryKeys.messages.all],
    refreshOnError: true,
    inlineErrors: false,
  });
}
