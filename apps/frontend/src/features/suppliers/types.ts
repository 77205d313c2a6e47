export const SUPPLIER_STATUSES = ['approved', 'probation', 'suspended'] as const;
export type SupplierStatus = (typeof SUPPLIER_STATUSES)[number];

export interface Supplier {
  id: number;
  name: string;
  code: string;
  contactEmail: string | null;
  status: SupplierStatus;
  notes: string | null;
  createdAt: string;
  updatedAt: string;
}

export const supplierStatusLabels: Record<SupplierStatus, string> = {
  approved: 'Approved',
  probation: 'On probation',
  suspended: 'Suspended',
};
