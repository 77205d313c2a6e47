import type { ReturnCosts, ReturnStatus } from './entities/vendor-return.entity';

/** A return moves one step at a time: draft → sent → acknowledged → closed. */
const NEXT: Record<ReturnStatus, ReturnStatus | null> = {
  draft: 'sent',
  sent: 'acknowledged',
  acknowledged: 'closed',
  closed: null,
};

export function canMove(from: ReturnStatus, to: ReturnStatus): boolean {
  return from === to || NEXT[from] === to;
}

/** Chargeback = inspection hours × hourly rate + freight + other, to the cent. */
export function chargeback(costs: ReturnCosts): number {
  const total =
    (costs.inspectionHours ?? 0) * (costs.hourlyRate ?? 0) +
    (costs.freight ?? 0) +
    (costs.other ?? 0);
  return Math.round(total * 100) / 100;
}

/** The costs as stored: only the fields given. */
export function cleanCosts(costs: ReturnCosts | undefined): ReturnCosts {
  const out: ReturnCosts = {};
  for (const k of ['inspectionHours', 'hourlyRate', 'freight', 'other'] as const) {
    if (typeof costs?.[k] === 'number') out[k] = costs[k];
  }
  return out;
}

export const OPEN_RETURN: readonly ReturnStatus[] = ['draft', 'sent', 'acknowledged'];
