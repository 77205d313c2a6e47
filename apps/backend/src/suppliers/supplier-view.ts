import type { Supplier } from './entities/supplier.entity';

export function supplierView(s: Supplier) {
  return {
    id: s.id,
    name: s.name,
    code: s.code,
    contactEmail: s.contactEmail,
    status: s.status,
    notes: s.notes,
    version: s.version,
    createdAt: s.createdAt,
    updatedAt: s.updatedAt,
  };
}
export type SupplierView = ReturnType<typeof supplierView>;

/** The supplier as other records show it. */
export function supplierRef(s: Supplier) {
  return { id: s.id, name: s.name, code: s.code, status: s.status };
}
