import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import type { LotSummary } from '@/features/lots/types';
import { queryKeys } from '@/lib/query-keys';

/** Units a delivery is counted in, as packing slips write them. */
export const LOT_UNITS = ['spools', 'reels', 'coils', 'kits', 'boxes', 'metres', 'feet'] as const;

const optionalCode = z.string().trim().max(64, 'At most 64 characters.');

/** Whole number of at least 1 (a lot of one is inspected whole, ISO 2859-1), or null. */
export function parseLotQuantity(text: string): number | null {
  const trimmed = text.trim();
  if (!/^\d+$/.test(trimmed)) return null;
  const value = Number(trimmed);
  return Number.isSafeInteger(value) && value >= 1 ? value : null;
}

export const createLotSchema = z.object({
  supplierId: z.number('Choose the supplier.').int().positive('Choose the supplier.'),
  productId: z.number('Choose the product.').int().positive('Choose the product.'),
  poNumber: z
    .string()
    .trim()
    .min(1, 'Enter the purchase order number.')
    .max(64, 'At most 64 characters.'),
  packingSlip: optionalCode,
  supplierLotCode: optionalCode,
  quantity: z
    .string()
    .refine((text) => parseLotQuantity(text) !== null, 'Enter a whole number of at least 1.'),
  unit: z.string().trim().min(1, 'Choose the unit.').max(16, 'At most 16 characters.'),
  notes: z.string().trim().max(2000, 'At most 2000 characters.'),
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
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createLot,
    meta: { inlineErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.lots.all }),
  });
}
