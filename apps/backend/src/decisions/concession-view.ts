import { isoDate } from '../common/calendar';
import type { Concession } from './entities/concession.entity';
import { clock } from '../common/clock';

/** A concession as the API shows it; `requestedBy`, `reviewedBy` and `lot` loaded. */
export function concessionView(c: Concession) {
  return {
    id: c.id,
    lotId: c.lot.id,
    status: c.status,
    scope: c.scope,
    quantity: c.quantity,
    unit: c.lot.unit,
    expiresOn: c.expiresOn,
    expired: c.expiresOn < isoDate(clock.now()),
    reason: c.reason,
    recommendation: c.recommendation,
    needsSecondApproval: c.needsSecondApproval,
    requestedBy: { id: c.requestedBy.id, name: c.requestedBy.name },
    requestedAt: c.requestedAt,
    reviewedBy: c.reviewedBy ? { id: c.reviewedBy.id, name: c.reviewedBy.name } : null,
    reviewedAt: c.reviewedAt,
    reviewNote: c.reviewNote,
    decisionId: c.decision?.id ?? null,
    version: c.version,
  };
}
export type ConcessionView = ReturnType<typeof concessionView>;
