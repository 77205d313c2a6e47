import { z } from 'zod';
import { LOT_QUANTITY } from '@gaugeproof/api-types';
import { api } from '@/lib/api-client';
import type { LotSummary } from '@/features/lots/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { maxChars } from '@/lib/contract-rules';

/** Units a delivery is counted in, as packing slips write them. */
export const LOT_UNITS = ['spools', 'reels', 'coils', 'kits', 'boxes', 'metres', 'feet'] as const;

const optionalCode = z
  .string()
  .trim()
  .max(...maxChars('reference'));

/** A whole number within the contract's LOT_QUANTITY (a lot of one is inspected whole), or null. */
export function parseLotQuantity(text: string): number | null {
  const trimmed = text.trim();
  if (!/^\d+$/.test(trimmed)) return null;
  const value = Number(trimmed);
  return value >= LOT_QUANTITY.min && value <= LOT_QUANTITY.max ? value : null;
}

export const createLotSchema = z.object({
  supplierId: z.number('Choose the supplier.').int().positive('Choose the supplier.'),
  productId: z.number('Choose the product.').int().positive('Choose the product.'),
  poNumber: z
    .string()
    .trim()
    .min(1, 'Enter the purchase order number.')
    .max(...maxChars('reference')),
  packingSlip: optionalCode,
  supplierLotCode: optionalCode,
  quantity: z
    .string()
    .refine((text) => {
      const digits = text.trim();
      return !/^\d+$/.test(digits) || Number(digits) <= LOT_QUANTITY.max;
    }, `At most ${LOT_QUANTITY.max} units in one lot.`)
    .refine(
      (text) => parseLotQuantity(text) !== null,
      `Enter a whole number of at least ${LOT_QUANTITY.min}.`,
    ),
  unit: z
    .string()
    .trim()
    .min(1, 'Choose the unit.')
    .max(...maxChars('unit')),
  notes: z
    .string()
    .trim()
    .max(...maxChars('long')),
});
export type CreateLotForm = z.infer<typeof createLotSchema>;

export const CREATE_LOT_FIELDS = [
  'productId',
  'poNumber',
  'packingSlip',
  'supplierLotCode',
  'quantity',
  'unit',
  'notes',
] as const;

export interface CreateLotRequest {
  productId: number;
  poNumber: string;
  packingSlip?: string;
  supplierLotCode?: string;
  quantity: number;
  unit: string;
  notes?: string;
  /** The clerk confirmed a second delivery under a PO and packing slip already received. */
  receiveAgain?: true;
}

/** The POST body: empty optional fields are left out, the quantity becomes a number. */
export function toCreateLotRequest(form: CreateLotForm, receiveAgain = false): CreateLotRequest {
  const request: CreateLotRequest = {
    productId: form.productId,
    poNumber: form.poNumber.trim(),
    quantity: parseLotQuantity(form.quantity) ?? Number.NaN,
    unit: form.unit.trim(),
  };
  if (form.packingSlip.trim()) request.packingSlip = form.packingSlip.trim();
  if (form.supplierLotCode.trim()) request.supplierLotCode = form.supplierLotCode.trim();
  if (form.notes.trim()) request.notes = form.notes.trim();
  if (receiveAgain) request.receiveAgain = true;
  return request;
}

export const createLot = (request: CreateLotRequest) => api.post<LotSummary>('/lots', request);

export function useCreateLot() {
  return useWriteMutation(createLot, {
    refresh: [queryKeys.lots.all],
  });
}
