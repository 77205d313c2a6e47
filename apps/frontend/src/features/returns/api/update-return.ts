import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { costsSchema } from '@/features/returns/api/cost-schema';
import type { ReturnCosts, VendorReturn } from '@/features/returns/types';
import { queryKeys } from '@/lib/query-keys';
import { maxChars } from '@/lib/contract-rules';

export const editReturnSchema = z.object({
  rmaNumber: z
    .string()
    .trim()
    .max(...maxChars('reference')),
  notes: z
    .string()
    .trim()
    .max(...maxChars('long')),
  supplierNote: z
    .string()
    .trim()
    .max(...maxChars('long')),
  shareDecisionReason: z.boolean(),
  currency: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z]{3}$/, 'Enter an ISO 4217 code such as EUR or USD.'),
  costs: costsSchema,
});
export type EditReturnForm = z.input<typeof editReturnSchema>;

export interface ReturnPatch {
  /** The version the edit was made on; a stale one is answered 409. */
  version: number;
  rmaNumber?: string;
  notes?: string;
  supplierNote?: string;
  shareDecisionReason?: boolean;
  currency?: string;
  costs?: ReturnCosts;
  lotIds?: number[];
}

export const updateReturn = ({ id, patch }: { id: number; patch: ReturnPatch }) =>
  api.patch<VendorReturn>(`/returns/${id}`, patch);

export function useUpdateReturn({ inlineErrors = false } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateReturn,
    meta: { inlineErrors },
    // A 409 means someone else changed it first: reload it either way.
    onSettled: async () => {
      await queryClient.invalidateQueries({ queryKey: queryKeys.returns.all });
      await queryClient.invalidateQueries({ queryKey: queryKeys.lots.all });
    },
  });
}
