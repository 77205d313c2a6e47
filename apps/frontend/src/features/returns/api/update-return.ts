import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { costsSchema } from '@/features/returns/api/cost-schema';
import type { ReturnCosts, ReturnStatus, VendorReturn } from '@/features/returns/types';

export const editReturnSchema = z.object({
  rmaNumber: z.string().trim().max(64, 'At most 64 characters.'),
  notes: z.string().trim().max(4000, 'At most 4000 characters.'),
  costs: costsSchema,
});
export type EditReturnForm = z.input<typeof editReturnSchema>;

export interface ReturnPatch {
  status?: ReturnStatus;
  rmaNumber?: string;
  notes?: string;
  costs?: ReturnCosts;
}

export const updateReturn = ({ id, patch }: { id: number; patch: ReturnPatch }) =>
  api.patch<VendorReturn>(`/returns/${id}`, patch);

export function useUpdateReturn({ inlineErrors = false } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateReturn,
    meta: { inlineErrors },
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: ['returns'] });
      // Sending a return marks its lots returned.
      await queryClient.invalidateQueries({ queryKey: ['lots'] });
    },
  });
}
