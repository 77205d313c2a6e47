import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { todayIso } from '@/lib/dates';
import type { CorrectiveAction } from '@/features/corrective-actions/types';
import { queryKeys } from '@/lib/query-keys';

export const createCorrectiveActionSchema = z.object({
  supplierId: z.number('Choose the supplier.').int().positive('Choose the supplier.'),
  lotIds: z.array(z.number().int()).max(100, 'At most 100 lots.'),
  problem: z
    .string()
    .trim()
    .min(10, 'Describe the problem in at least 10 characters.')
    .max(4000, 'At most 4000 characters.'),
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
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCorrectiveAction,
    meta: { inlineErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.correctiveActions.all }),
  });
}
