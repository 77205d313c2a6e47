import type { EntityManager } from '@mikro-orm/core';
import { Lot } from '../lots/entities/lot.entity';
import { plainSql } from '../common/plain-sql';
import { lotSummary } from '../lots/lot-summary';
import { evidenceOf } from './lot-status';

/**
 * Lots awaiting a decision whose nonconforming units already reach the plan's reject
 * number Re (curtailed rejection, MIL-STD-105E / ISO 2859-1): the QA lead's first work on
 * Today. Lots awaiting a decision are few (they leave the status when decided), so each
 * is judged with the same evidence query the status rule uses (lot-status.ts). A lot whose
 * concession waits for a second approval is left out: its QA lead has decided as far as
 * they may, and the approvers find it among the concessions awaiting approval.
 */
export async function lotsAtRejectNumber(em: EntityManager) {
  const lots = await em.find(
    Lot,
    { status: 'awaiting_decision' },
    { populate: ['product', 'supplier', 'receivedBy'], orderBy: { receivedAt: 'asc', id: 'asc' } },
  );
  const pending = await plainSql<{ lot_id: number | string }[]>(
    em,
    "select lot_id from concessions where status = 'pending'",
  );
  const waitingForApproval = new Set(pending.map((row) => Number(row.lot_id)));
  const found = [];
  for (const lot of lots) {
    if (waitingForApproval.has(lot.id)) continue;
    const plan = lot.samplingPlan;
    const evidence = await evidenceOf(em, {
      id: lot.id,
      productId: lot.product.id,
      sampleSize: plan.sampleSize,
      reject: plan.reject,
    });
    if (!evidence.rejectReached) continue;
    found.push({
      ...lotSummary(lot),
      nonconformingUnits: evidence.nonconformingUnits,
      reject: plan.reject,
    });
  }
  return { items: found, total: found.length };
}
