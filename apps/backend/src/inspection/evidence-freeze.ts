import type { EntityManager } from '@mikro-orm/core';
import { DomainError } from '../common/domain-error';
import { plainSql } from '../common/plain-sql';

/**
 * Statuses of a return whose notice went to the supplier (e-mailed or shipped, and every
 * step after). From then on the lot's evidence is what the supplier was told: it is frozen.
 * A draft has told nobody anything, and a cancelled return (only a draft can be cancelled)
 * never did, so neither freezes (issue 17 item 10).
 */
export const SENT_RETURN_STATUSES = [
  'emailed',
  'shipped',
  'acknowledged',
  'credited',
  'closed',
] as const;

/** The latest sent return holding the lot, or null. */
export async function sentReturnOf(
  em: EntityManager,
  lotId: number,
): Promise<{ number: string; status: string } | null> {
  const [row] = await plainSql<{ number: string; status: string }[]>(
    em,
    `select r.number, r.status from vendor_returns r
       join vendor_return_lots l on l.vendor_return_id = r.id
      where l.lot_id = ? and r.status in (${SENT_RETURN_STATUSES.map(() => '?').join(', ')})
      order by r.id desc`,
    [lotId, ...SENT_RETURN_STATUSES],
  );
  return row ?? null;
}

const STATUS_WORDS: Record<string, string> = {
  emailed: 'e-mailed to the supplier',
  shipped: 'shipped to the supplier',
  acknowledged: 'acknowledged by the supplier',
  credited: 'credited by the supplier',
  closed: 'closed',
};

/**
 * Refuses (422) a change to the lot's evidence once a return of it was sent: the supplier
 * holds a notice and an evidence pack built from it. `what` says what was refused ("this
 * reading cannot be voided").
 */
export async function assertEvidenceNotSent(
  em: EntityManager,
  lot: { id: number; poNumber: string },
  what: string,
  field: string | null = null,
): Promise<void> {
  const sent = await sentReturnOf(em, lot.id);
  if (!sent) return;
  throw DomainError.refused(
    `Lot ${lot.poNumber} went back to the supplier on return ${sent.number} (${STATUS_WORDS[sent.status] ?? sent.status}); its evidence is frozen as the supplier received it, so ${what}.`,
    field,
  );
}
