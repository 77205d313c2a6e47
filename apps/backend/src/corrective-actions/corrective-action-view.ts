import { daysBetween } from '../common/calendar';
import type { CorrectiveAction } from './entities/corrective-action.entity';
import { AWAITING_SUPPLIER } from './corrective-action-rules';

/** CorrectiveAction as the API shows it; supplier, lots and createdBy loaded. */
export function correctiveActionView(c: CorrectiveAction, today: string) {
  const late = AWAITING_SUPPLIER.includes(c.status) ? daysBetween(c.dueOn, today) : 0;
  return {
    id: c.id,
    number: c.number,
    status: c.status,
    version: c.version,
    supplier: {
      id: c.supplier.id,
      name: c.supplier.name,
      code: c.supplier.code,
      status: c.supplier.status,
    },
    lots: c.lots
      .getItems()
      .sort((a, b) => a.id - b.id)
      .map((l) => ({ id: l.id, poNumber: l.poNumber, status: l.status })),
    problem: c.problem,
    dueOn: c.dueOn,
    overdue: late > 0,
    daysOverdue: Math.max(0, late),
    containment: c.containment,
    rootCause: c.rootCause,
    correctiveAction: c.correctiveAction,
    respondedAt: c.respondedAt,
    respondedBy: c.respondedBy,
    promisedOn: c.promisedOn,
    reopenComment: c.reopenComment,
    verification: c.verifiedAt
      ? {
          by: c.verifiedBy ? { id: c.verifiedBy.id, name: c.verifiedBy.name } : null,
          at: c.verifiedAt,
          note: c.verificationNote,
          lot: c.verifiedLot ? { id: c.verifiedLot.id, poNumber: c.verifiedLot.poNumber } : null,
        }
      : null,
    closedAt: c.closedAt,
    createdBy: { id: c.createdBy.id, name: c.createdBy.name },
    createdAt: c.createdAt,
    updatedAt: c.updatedAt,
  };
}
export type CorrectiveActionView = ReturnType<typeof correctiveActionView>;
