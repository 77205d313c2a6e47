import { RETURN_STATUSES, type ReturnStatus } from '@gaugeproof/api-types';
/** VendorReturn as GET /api/returns/:id shows it. */
export { RETURN_STATUSES, type ReturnStatus };

export interface ReturnCosts {
  inspectionHours?: number;
  hourlyRate?: number;
  freight?: number;
  other?: number;
}

export interface ReturnLot {
  id: number;
  poNumber: string;
  status: string;
  quantity: number;
  unit: string;
}

export interface VendorReturn {
  id: number;
  number: string;
  status: ReturnStatus;
  /** Optimistic lock: send it back with every change. */
  version: number;
  supplier: { id: number; name: string; code: string; status: string; contactEmail: string | null };
  lots: ReturnLot[];
  rmaNumber: string | null;
  notes: string | null;
  /** Why the goods come back, written for the supplier. */
  supplierNote: string | null;
  shareDecisionReason: boolean;
  costs: ReturnCosts;
  chargebackTotal: number;
  /** ISO 4217 code of every amount. */
  currency: string;
  emailedAt: string | null;
  shipment: {
    carrier: string;
    trackingNumber: string | null;
    shippedOn: string;
    quantity: number;
  } | null;
  acknowledgedAt: string | null;
  credit: { creditNoteNumber: string; amount: number; creditedAt: string } | null;
  closedAt: string | null;
  cancelReason: string | null;
  cancelledAt: string | null;
  createdBy: { id: number; name: string };
  createdAt: string;
  updatedAt: string;
}

export const returnStatusLabels: Record<ReturnStatus, string> = {
  draft: 'Draft',
  emailed: 'Notice e-mailed',
  shipped: 'Shipped',
  acknowledged: 'Acknowledged',
  credited: 'Credited',
  closed: 'Closed',
  cancelled: 'Cancelled',
};
