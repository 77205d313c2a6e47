import { CAR_STATUSES, type CorrectiveActionStatus } from '@gaugeproof/api-types';
/** Supplier corrective action request (SCAR), docs/api-conventions.md CorrectiveAction. */
export { CAR_STATUSES, type CorrectiveActionStatus };

export interface CorrectiveAction {
  id: number;
  number: string;
  status: CorrectiveActionStatus;
  /** Optimistic lock: send it back with every change. */
  version: number;
  supplier: { id: number; name: string; code: string; status: string };
  lots: { id: number; poNumber: string; status: string }[];
  problem: string;
  /** Calendar date YYYY-MM-DD. */
  dueOn: string;
  /** Open or reopened past dueOn (the server's UTC calendar day). */
  overdue: boolean;
  daysOverdue: number;
  containment: string | null;
  rootCause: string | null;
  correctiveAction: string | null;
  respondedAt: string | null;
  /** `supplier link (…)` when the supplier answered on its page, else who recorded it. */
  respondedBy: string | null;
  promisedOn: string | null;
  reopenComment: string | null;
  verification: {
    by: { id: number; name: string } | null;
    at: string;
    note: string | null;
    lot: { id: number; poNumber: string } | null;
  } | null;
  closedAt: string | null;
  createdBy: { id: number; name: string };
  createdAt: string;
  updatedAt: string;
}

export const carStatusLabels: Record<CorrectiveActionStatus, string> = {
  open: 'Open',
  responded: 'Responded',
  verified: 'Verified',
  reopened: 'Reopened',
  closed: 'Closed',
};
