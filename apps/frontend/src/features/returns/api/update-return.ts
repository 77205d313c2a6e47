import { CURRENCY_CODE } from '@gaugeproof/api-types';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { returnFields } from '@/features/returns/api/create-return';
import type { ReturnCosts, VendorReturn } from '@/features/returns/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { maxChars } from '@/lib/contract-rules';

export const editReturnSchema = z.object({
  ...returnFields,
  supplierNote: z
    .string()
    .trim()
    .max(...maxChars('long')),
  shareDecisionReason: z.boolean(),
  currency: z
    .string()
    .trim()
    .toUpperCase()
    .regex(CURRENCY_CODE, 'Enter an ISO 4217 code such as EUR or USD.'),
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
  return useWriteMutation(updateReturn, {
    refresh: [queryKeys.returns.all, queryKeys.lots.all],
    // A 409 means someone else changed it first: reload it either way.
    refreshOnError: true,
    inlineErrors,
  });
}
