import type { OutboundMessage } from '@gaugeproof/api-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';
import { maxChars } from '@/lib/contract-rules';

export const emailReturnSchema = z.object({
  to: z.string().trim().pipe(z.email('Enter a valid e-mail address.')),
  message: z.string().max(...maxChars('long')),
});
export type EmailReturnInput = z.infer<typeof emailReturnSchema>;

/** The stored outbound message; its status tells whether it went (sent, failed, logged). */
export type SentMessage = OutboundMessage;

export const emailReturn = ({ id, input }: { id: number; input: EmailReturnInput }) =>
  api.post<SentMessage>(`/returns/${id}/email`, {
    to: input.to.trim(),
    message: input.message.trim() || undefined,
  });

export function useEmailReturn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: emailReturn,
    meta: { inlineErrors: true },
    // E-mailing a draft marks it e-mailed and its lots returned.
    onSettled: async () => {
      await queryClient.invalidateQueries({ queryKey: queryKeys.messages.all });
      await queryClient.invalidateQueries({ queryKey: queryKeys.returns.all });
      await queryClient.invalidateQueries({ queryKey: queryKeys.lots.all });
    },
  });
}
