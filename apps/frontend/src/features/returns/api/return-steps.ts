import { z } from 'zod';
import { api } from '@/lib/api-client';
import type { ReturnStep } from '@/features/returns/lib/return-steps';
import type { VendorReturn } from '@/features/returns/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { decimalText, maxChars } from '@/lib/contract-rules';
import { RETURN_AMOUNTS, TEXT_MIN } from '@gaugeproof/api-types';

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Pick a date.')
  .refine((d) => !Number.isNaN(Date.parse(`${d}T00:00:00Z`)), 'Pick a real date.');

/** The goods left: the server checks the same (ShipReturnDto). */
export const shipSchema = z.object({
  carrier: z
    .string()
    .trim()
    .min(TEXT_MIN.carrier, 'Name the carrier.')
    .max(...maxChars('reference')),
  trackingNumber: z
    .string()
    .trim()
    .max(...maxChars('reference')),
  shippedOn: isoDate,
  quantity: decimalText('Enter how much went back.').pipe(
    z
      .number()
      .positive('Enter how much went back.')
      .max(RETURN_AMOUNTS.shippedQuantity.max, `At most ${RETURN_AMOUNTS.shippedQuantity.max}.`),
  ),
});
export type ShipInput = z.input<typeof shipSchema>;

export const creditSchema = z.object({
  creditNoteNumber: z
    .string()
    .trim()
    .min(1, 'Enter the credit note number.')
    .max(...maxChars('reference')),
  creditAmount: decimalText('Enter the amount credited.').pipe(
    z
      .number()
      .min(0, 'The amount cannot be negative.')
      .max(RETURN_AMOUNTS.creditAmount.max, `At most ${RETURN_AMOUNTS.creditAmount.max}.`)
      .refine((v) => Math.round(v * 100) === v * 100, 'At most 2 decimals.'),
  ),
});
export type CreditInput = z.input<typeof creditSchema>;

export const cancelSchema = z.object({
  reason: z
    .string()
    .trim()
    .min(TEXT_MIN.cancelReason, `Say why in at least ${TEXT_MIN.cancelReason} characters.`)
    .max(...maxChars('reason')),
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
  return useWriteMutation(takeReturnStep, {
    refresh: [queryKeys.returns.all, queryKeys.lots.all],
    // Shipping a draft marks its lots returned; cancelling frees them.
    refreshOnError: true,
  });
}
