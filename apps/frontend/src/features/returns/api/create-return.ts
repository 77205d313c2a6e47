import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { costsFromForm, costsSchema } from '@/features/returns/api/cost-schema';
import type { VendorReturn } from '@/features/returns/types';
import { queryKeys } from '@/lib/query-keys';
import { maxChars } from '@/lib/contract-rules';

export const createReturnSchema = z.object({
  supplierId: z.number('Choose the supplier.').int().positive('Choose the supplier.'),
  lotIds: z.array(z.number().int()).min(1, 'Choose at least one rejected lot.').max(100),
  rmaNumber: z
    .string()
    .trim()
    .max(...maxChars('reference')),
  notes: z
    .string()
    .trim()
    .max(...maxChars('long')),
  costs: costsSchema,
});
export type CreateReturnForm = z.input<typeof createReturnSchema>;

export const createReturn = (form: CreateReturnForm) =>
  api.post<VendorReturn>('/returns', {
    lotIds: form.lotIds,
    rmaNumber: form.rmaNumber.trim() || undefined,
    notes: form.notes.trim() || undefined,
    costs: costsFromForm(form.costs),
  });

export function useCreateReturn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createReturn,
    meta: { inlineErrors: true },
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: queryKeys.returns.all });
      await queryClient.invalidateQueries({ queryKey: queryKeys.lots.all });
    },
  });
}
