import type { ReturnCosts, ReturnStatus } from './entities/vendor-return.entity';

/**
 * Where a return may go next. The notice and the goods are separate steps: a draft is
 * e-mailed or shipped first, either way round; a draft may be cancelled, nothing later may.
 */
const NEXT: Record<ReturnStatus, readonly ReturnStatus[]> = {
  draft: ['emailed', 'shipped', 'cancelled'],
  emailed: ['shipped'],
  shipped: ['acknowledged'],
  acknowledged: ['credited', 'closed'],
  credited: ['closed'],
  closed: [],
  cancelled: [],
};

export function canMove(from: ReturnStatus, to: ReturnStatus): boolean {
  return NEXT[from].includes(to);
}

export function allowedNext(from: ReturnStatus): readonly ReturnStatus[] {
  return NEXT[from];
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

/** A lot on a return in one of these is taken: no second return may claim it. */
export const OPEN_RETURN: readonly ReturnStatus[] = [
  'draft',
  'emailed',
  'shipped',
  'acknowledged',
  'credited',
];

/** Returns that count in scorecards and chargebacks: all but the cancelled. */
export const COUNTED_RETURN: readonly ReturnStatus[] = OPEN_RETURN.concat('closed');
