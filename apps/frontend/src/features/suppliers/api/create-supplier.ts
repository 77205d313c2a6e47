import { z } from 'zod';
import { api } from '@/lib/api-client';
import { SUPPLIER_STATUSES, type Supplier } from '@/features/suppliers/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { maxChars } from '@/lib/contract-rules';

/** The supplier form, for creating and editing; the server checks the same rules again. */
export const supplierSchema = z.object({
  name: z
    .string()
    .trim()
    .min(1, 'Enter the supplier’s name.')
    .max(...maxChars('supplierName')),
  code: z
    .string()
    .trim()
    .min(1, 'Enter a short code, e.g. NCW.')
    .max(...maxChars('supplierCode'))
    .regex(/^[A-Za-z0-9][A-Za-z0-9_-]*$/, 'Letters, digits, - and _ only.'),
  contactEmail: z
    .string()
    .trim()
    .refine((v) => v === '' || z.email().safeParse(v).success, 'Enter a valid e-mail address.'),
  status: z.enum(SUPPLIER_STATUSES, 'Choose a status.'),
  notes: z.string().max(...maxChars('long')),
});
export type SupplierInput = z.infer<typeof supplierSchema>;

export interface SupplierBody {
  name: string;
  code: string;
  contactEmail: string | null;
  status: Supplier['status'];
  notes: string | null;
}

export const toSupplierBody = (input: SupplierInput): SupplierBody => ({
  name: input.name,
  code: input.code,
  contactEmail: input.contactEmail === '' ? null : input.contactEmail,
  status: input.status,
  notes: input.notes.trim() === '' ? null : input.notes.trim(),
});

export const createSupplier = (body: SupplierBody) => api.post<Supplier>('/suppliers', body);

export function useCreateSupplier() {
  return useWriteMutation(createSupplier, {
    refresh: [queryKeys.suppliers.all],
  });
}
