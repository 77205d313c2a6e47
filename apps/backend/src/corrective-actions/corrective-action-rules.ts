import type { CorrectiveActionStatus } from './entities/corrective-action.entity';

/** SCAR workflow: the supplier responds, we verify or reopen, a verified one is closed. */
const NEXT: Record<CorrectiveActionStatus, readonly CorrectiveActionStatus[]> = {
  open: ['responded'],
  responded: ['verified', 'reopened'],
  reopened: ['responded'],
  verified: ['closed'],
  closed: [],
};

export function canMove(from: CorrectiveActionStatus, to: CorrectiveActionStatus): boolean {
  return from === to || NEXT[from].includes(to);
}

export function allowedNext(from: CorrectiveActionStatus): readonly CorrectiveActionStatus[] {
  return NEXT[from];
}

/** Still waiting on the supplier: these can be overdue. */
export const AWAITING_SUPPLIER: readonly CorrectiveActionStatus[] = ['open', 'reopened'];
