/** VendorReturn as GET /api/returns/:id shows it. */
export const RETURN_STATUSES = ['draft', 'sent', 'acknowledged', 'closed'] as const;
export type ReturnStatus = (typeof RETURN_STATUSES)[number];

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
  supplier: { id: number; name: string; code: string; status: string; contactEmail: string | null };
  lots: ReturnLot[];
  rmaNumber: string | null;
  notes: string | null;
  costs: ReturnCosts;
  chargebackTotal: number;
  createdBy: { id: number; name: string };
  createdAt: string;
  updatedAt: string;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export const returnStatusLabels: Record<ReturnStatus, string> = {
  draft: 'Draft',
  sent: 'Sent',
  acknowledged: 'Acknowledged',
  closed: 'Closed',
};
