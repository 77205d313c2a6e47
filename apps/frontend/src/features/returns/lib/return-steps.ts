import { RETURN_STATUSES, type ReturnStatus } from '@/features/returns/types';

/** A return moves one step at a time: draft → sent → acknowledged → closed (issue 5). */
export function nextReturnStatus(status: ReturnStatus): ReturnStatus | null {
  const i = RETURN_STATUSES.indexOf(status);
  return RETURN_STATUSES[i + 1] ?? null;
}

/** The command that moves a return on, in purchasing's words. */
export const nextStepLabels: Record<ReturnStatus, string> = {
  draft: 'Mark as sent',
  sent: 'Mark as acknowledged',
  acknowledged: 'Close the return',
  closed: '',
};

/** Only an open return may be edited; a closed one is the record. */
export const returnEditable = (status: ReturnStatus) => status !== 'closed';
