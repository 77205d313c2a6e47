import { api } from '@/lib/api-client';
import type { SupplierBody } from '@/features/suppliers/api/create-supplier';
import type { Supplier } from '@/features/suppliers/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';

export type SupplierPatch = Partial<SupplierBody>;

/** An edit of the supplier as loaded at `version`; a stale version is answered 409. */
export const updateSupplier = ({
  id,
  version,
  patch,
}: {
  id: number;
  version: number;
  patch: SupplierPatch;
}) => api.patch<Supplier>(`/suppliers/${id}`, { version, ...patch });

/** Only what changed goes to the server (and into the audit trail). */
export function supplierPatch(supplier: Supplier, body: SupplierBody): SupplierPatch {
  const patch: SupplierPatch = {};
  for (const key of ['name', 'code', 'contactEmail', 'status', 'notes'] as const) {
    if (body[key] !== supplier[key]) Object.assign(patch, { [key]: body[key] });
  }
  return patch;
}

export function useUpdateSupplier() {
  return useWriteMutation(updateSupplier, {
    refresh: [queryKeys.suppliers.all],
  });
}
