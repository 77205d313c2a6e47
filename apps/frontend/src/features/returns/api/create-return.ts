import { LOTS_PER_REQUEST } from '@gaugeproof/api-types';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { costsFromForm, costsSchema } from '@/features/returns/api/cost-schema';
import type { VendorReturn } from '@/features/returns/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { maxChars } from '@/lib/contract-rules';

/** The fields a return's create and edit forms share. */
export const returnFields = {
  rmaNumber: z
    .string()
    .trim()
    .max(...maxChars('reference')),
  notes: z
    .string()
    .trim()
    .max(...maxChars('long')),
  costs: costsSchema,
};

export const createReturnSchema = z.object({
  supplierId: z.number('Choose the supplier.').int().positive('Choose the supplier.'),
  lotIds: z
    .array(z.number().int())
    .min(LOTS_PER_REQUEST.min, 'Choose at least one rejected lot.')
    .max(LOTS_PER_REQUEST.max),
  ...returnFields,
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
  return useWriteMutation(createReturn, {
    refresh: [queryKeys.returns.all, queryKeys.lots.all],
  });
}
