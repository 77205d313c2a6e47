import { z } from 'zod';
import { api } from '@/lib/api-client';
import type { CorrectiveAction, CorrectiveActionStatus } from '@/features/corrective-actions/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { maxChars } from '@/lib/contract-rules';
import { TEXT_MIN } from '@gaugeproof/api-types';

const answer = (what: string) =>
  z
    .string()
    .trim()
    .min(TEXT_MIN.answer, `Give the supplier's ${what} in at least ${TEXT_MIN.answer} characters.`)
    .max(...maxChars('long'));

/** The supplier's response, recorded by purchasing. */
export const responseSchema = z.object({
  containment: answer('containment'),
  rootCause: answer('root cause'),
  correctiveAction: answer('corrective action'),
});
export type ResponseInput = z.infer<typeof responseSchema>;

export interface CorrectiveActionPatch extends Partial<ResponseInput> {
  /** The version the change was made on; the server answers 409 when it moved on. */
  version: number;
  status?: CorrectiveActionStatus;
  /** Reopen: what more the supplier must do; e-mailed to it. */
  comment?: string;
  /** Verify: the evidence that the fix works. */
  verificationNote?: string;
}

export const updateCorrectiveAction = ({
  id,
  patch,
}: {
  id: number;
  patch: CorrectiveActionPatch;
}) => api.patch<CorrectiveAction>(`/corrective-actions/${id}`, patch);

export function useUpdateCorrectiveAction({ inlineErrors = false } = {}) {
  return useWriteMutation(updateCorrectiveAction, {
    refresh: [queryKeys.correctiveActions.all],
    // A 409 means someone else changed it: reload it either way.
    refreshOnError: true,
    inlineErrors,
  });
}
