import type { ReturnStatus } from '@/features/returns/types';

/** The way a return goes when nothing is cancelled (the stepper's steps). */
export const RETURN_PATH: readonly ReturnStatus[] = [
  'draft',
  'emailed',
  'shipped',
  'acknowledged',
  'credited',
  'closed',
];

/** A step purchasing takes on a return, as the server names it (POST /returns/:id/<step>). */
export type ReturnStep = 'ship' | 'acknowledge' | 'credit' | 'close' | 'cancel';

/**
 * The steps a return in `status` may take, as the server allows them: a draft is e-mailed
 * (from the e-mail dialog) or shipped, or cancelled; then acknowledged, credited, closed.
 */
const STEPS: Record<ReturnStatus, readonly ReturnStep[]> = {
  draft: ['ship', 'cancel'],
  emailed: ['ship'],
  shipped: ['acknowledge'],
  acknowledged: ['credit', 'close'],
  credited: ['close'],
  closed: [],
  cancelled: [],
};
export const returnSteps = (status: ReturnStatus) => STEPS[status];

/** The command that takes each step, in purchasing's words. */
export const stepLabels: Record<ReturnStep, string> = {
  ship: 'Record shipment',
  acknowledge: 'Mark as acknowledged',
  credit: 'Record credit note',
  close: 'Close the return',
  cancel: 'Cancel the return',
};

/** Only an open return may be edited; a closed or cancelled one is the record. */
export const returnEditable = (status: ReturnStatus) =>
  status !== 'closed' && status !== 'cancelled';

/** Lots, costs and currency change only while a draft. */
export const draftOnly = (status: ReturnStatus) => status === 'draft';
