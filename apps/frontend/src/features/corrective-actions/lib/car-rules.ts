import type { CorrectiveActionStatus } from '@/features/corrective-actions/types';

/**
 * open → responded → verified | reopened → closed (issue 5): the supplier responds, the
 * response is verified (then closed) or reopened, and a reopened request is answered again.
 */
const NEXT: Record<CorrectiveActionStatus, readonly CorrectiveActionStatus[]> = {
  open: ['responded'],
  responded: ['verified', 'reopened'],
  reopened: ['responded'],
  verified: ['closed'],
  closed: [],
};

export function allowedTransitions(
  status: CorrectiveActionStatus,
): readonly CorrectiveActionStatus[] {
  return NEXT[status];
}

/** Moves that are a plain status change; `responded` comes with the response form instead. */
export function statusCommands(status: CorrectiveActionStatus): CorrectiveActionStatus[] {
  return NEXT[status].filter((s) => s !== 'responded');
}

/** The supplier's response is awaited while the request is open or reopened. */
export const awaitingResponse = (status: CorrectiveActionStatus) =>
  status === 'open' || status === 'reopened';

export { todayIso } from '@/lib/dates';

export const commandLabels: Partial<Record<CorrectiveActionStatus, string>> = {
  verified: 'Verify the response',
  reopened: 'Reopen',
  closed: 'Close',
};
