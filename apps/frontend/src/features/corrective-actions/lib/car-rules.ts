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

/** Today's calendar date in the user's time zone, YYYY-MM-DD. */
export function todayIso(now = new Date()): string {
  const m = String(now.getMonth() + 1).padStart(2, '0');
  const d = String(now.getDate()).padStart(2, '0');
  return `${now.getFullYear()}-${m}-${d}`;
}

export const commandLabels: Partial<Record<CorrectiveActionStatus, string>> = {
  verified: 'Verify the response',
  reopened: 'Reopen',
  closed: 'Close',
};
