import type { OutboundMessage } from '@gaugeproof/api-types';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
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
  return useWriteMutation(emailReturn, {
    refresh: [queryKeys.messages.all, queryKeys.returns.all, queryKeys.lots.all],
    // E-mailing a draft marks it e-mailed and its lots returned.
    refreshOnError: true,
  });
}
