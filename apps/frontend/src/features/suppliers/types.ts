import type { SupplierStatus } from '@gaugeproof/api-types';
/** The enum and the shape are the contract's (libs/api-types). */
export { SUPPLIER_STATUSES, type Supplier, type SupplierStatus } from '@gaugeproof/api-types';

export const supplierStatusLabels: Record<SupplierStatus, string> = {
  approved: 'Approved',
  probation: 'On probation',
  suspended: 'Suspended',
};
