import type { EntityManager } from '@mikro-orm/core';
import { Decision } from './entities/decision.entity';
import { Nonconformance } from './entities/nonconformance.entity';

/** Decision as the API shows it (docs/api-conventions.md). */
export function decisionView(d: Decision, ncrNumber: string | null) {
  return {
    id: d.id,
    outcome: d.outcome,
    recommendation: d.recommendation,
    reason: d.reason,
    decidedBy: { id: d.decidedBy.id, name: d.decidedBy.name },
    decidedAt: d.decidedAt,
    lotVersion: d.lotVersion,
    ncrNumber,
  };
}
export type DecisionView = ReturnType<typeof decisionView>;

/** A lot's decisions, oldest first (the last one stands), with their NCR numbers. */
export async function decisionsOfLot(em: EntityManager, lotId: number): Promise<DecisionView[]> {
  const decisions = await em.find(
    Decision,
    { lot: lotId },
    { populate: ['decidedBy'], orderBy: { decidedAt: 'asc', id: 'asc' } },
  );
  const ncrs = await em.find(Nonconformance, { lot: lotId });
  const byDecision = new Map(ncrs.map((n) => [n.decision.id, n.number]));
  return decisions.map((d) => decisionView(d, byDecision.get(d.id) ?? null));
}

/** The NCR number of a lot's newest nonconformance report, if it has one. */
export async function ncrNumberOfLot(em: EntityManager, lotId: number): Promise<string | null> {
  const ncr = await em.findOne(Nonconformance, { lot: lotId }, { orderBy: { id: 'desc' } });
  return ncr?.number ?? null;
}
