import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import type { ReturnStep } from '@/features/returns/lib/return-steps';
import type { VendorReturn } from '@/features/returns/types';
import { queryKeys } from '@/lib/query-keys';

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Pick a date.')
  .refine((d) => !Number.isNaN(Date.parse(`${d}T00:00:00Z`)), 'Pick a real date.');

/** The goods left: the server checks the same (ShipReturnDto). */
export const shipSchema = z.object({
  carrier: z.string().trim().min(2, 'Name the carrier.').max(64, 'At most 64 characters.'),
  trackingNumber: z.string().trim().max(64, 'At most 64 characters.'),
  shippedOn: isoDate,
  quantity: z.coerce
    .number({ message: 'Enter how much went back.' })
    .positive('Enter how much went back.')
    .max(100_000_000, 'At most 100000000.'),
});
export type ShipInput = z.input<typeof shipSchema>;

export const creditSchema = z.object({
  creditNoteNumber: z
    .string()
    .trim()
    .min(1, 'Enter the credit note number.')
    .max(64, 'At most 64 characters.'),
  creditAmount: z.coerce
    .number({ message: 'Enter the amount credited.' })
    .min(0, 'The amount cannot be negative.')
    .max(10_000_000, 'At most 10000000.')
    .refine((v) => Math.round(v * 100) === v * 100, 'At most 2 decimals.'),
});
export type CreditInput = z.input<typeof creditSchema>;

export const cancelSchema = z.object({
  reason: z
    .string()
    .trim()
    .min(5, 'Say why in at least 5 characters.')
    .max(2000, 'At most 2000 characters.'),
});
export type CancelInput = z.input<typeof cancelSchema>;

export interface StepRequest {
  id: number;
  step: ReturnStep;
  /** The version the step is taken on; a stale one is answered 409. */
  version: number;
  body?: Record<string, unknown>;
}

export const takeReturnStep = ({ id, step, version, body }: StepRequest) =>
  api.post<VendorReturn>(`/returns/${id}/${step}`, { version, ...body });

export function useReturnStep() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: takeReturnStep,
    meta: { inlineErrors: true },
    onSettled: async () => {
      await queryClient.invalidateQueries({ queryKey: queryKeys.returns.all });
      // Shipping a draft marks its lots returned; cancelling frees them.
      await queryClient.invalidateQueries({ queryKey: queryKeys.lots.all });
    },
  });
}
