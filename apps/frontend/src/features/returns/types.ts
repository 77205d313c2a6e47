import { RETURN_STATUSES, type ReturnStatus, type VendorReturn } from '@gaugeproof/api-types';
/** VendorReturn as GET /api/returns/:id shows it: the contract's enum and shape. */
export { RETURN_STATUSES, type ReturnStatus };

export type { ReturnCosts, VendorReturn } from '@gaugeproof/api-types';
/** One lot of a return. */
export type ReturnLot = VendorReturn['lots'][number];

export const returnStatusLabels: Record<ReturnStatus, string> = {
  draft: 'Draft',
  emailed: 'Notice e-mailed',
  shipped: 'Shipped',
  acknowledged: 'Acknowledged',
  credited: 'Credited',
  closed: 'Closed',
  cancelled: 'Cancelled',
};
