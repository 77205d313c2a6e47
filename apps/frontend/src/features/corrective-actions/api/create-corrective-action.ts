import { z } from 'zod';
import { api } from '@/lib/api-client';
import { todayIso } from '@/lib/dates';
import type { CorrectiveAction } from '@/features/corrective-actions/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { maxChars } from '@/lib/contract-rules';
import { LOTS_PER_REQUEST, TEXT_MIN } from '@gaugeproof/api-types';

export const createCorrectiveActionSchema = z.object({
  supplierId: z.number('Choose the supplier.').int().positive('Choose the supplier.'),
  lotIds: z
    .array(z.number().int())
    .max(LOTS_PER_REQUEST.max, `At most ${LOTS_PER_REQUEST.max} lots.`),
  problem: z
    .string()
    .trim()
    .min(TEXT_MIN.problem, `Describe the problem in at least ${TEXT_MIN.problem} characters.`)
    .max(...maxChars('long')),
  dueOn: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'Choose the date the response is due.')
    // Read at validation time, so a form left open overnight still checks against today.
    .refine((d) => d >= todayIso(), 'The due date cannot be in the past.'),
});
export type CreateCorrectiveActionInput = z.infer<typeof createCorrectiveActionSchema>;

export const createCorrectiveAction = (input: CreateCorrectiveActionInput) =>
  api.post<CorrectiveAction>('/corrective-actions', { ...input, problem: input.problem.trim() });

export function useCreateCorrectiveAction() {
  return useWriteMutation(createCorrectiveAction, {
    refresh: [queryKeys.correctiveActions.all],
  });
}
