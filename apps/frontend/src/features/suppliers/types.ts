export const SUPPLIER_STATUSES = ['approved', 'probation', 'suspended'] as const;
export type SupplierStatus = (typeof SUPPLIER_STATUSES)[number];

export interface Supplier {
  id: number;
  name: string;
  code: string;
  contactEmail: string | null;
  status: SupplierStatus;
  notes: string | null;
  /** Moves on every save; an edit sends the one it was made on (a stale one: 409). */
  version: number;
  createdAt: string;
  updatedAt: string;
}

export const supplierStatusLabels: Record<SupplierStatus, string> = {
  approved: 'Approved',
  probation: 'On probation',
  suspended: 'Suspended',
};
