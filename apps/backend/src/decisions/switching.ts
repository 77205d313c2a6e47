import {
  lotOutcome,
  nextInspectionState,
  type InspectionSeverity,
  type InspectionState,
  type LotResult,
} from '@gaugeproof/standards';
import type { Evaluation } from '../inspection/lot-evaluation';
import type { Lot } from '../lots/entities/lot.entity';
import { standardsPlan } from '../products/sampling-plan';
import type { DecisionOutcome } from './entities/decision.entity';

/** What a decision did to the product's switching state, for the QA lead. */
export interface SwitchingNotice {
  from: InspectionSeverity;
  to: InspectionSeverity;
  changed: boolean;
  /** Normal inspection may move to reduced, awaiting the QA lead's approval. */
  reducedAvailable: boolean;
  message: string;
}

/** Stored in Decision.evaluation so a superseding decision can recount the stream. */
export interface SwitchingRecord {
  applied: boolean;
  before: InspectionState;
  after: InspectionState;
}

/**
 * The lot result the switching rules count. ISO 2859-1 (clause 9.3) switches on lots
 * "not accepted on original inspection": a lot taken on concession failed the plan and is
 * used anyway, so it counts as not accepted (our reading of the clause; common practice).
 * Only a plain accept counts as accepted. The plan and count go along only when they agree
 * with the decision (a QA lead who overrides the count must not break the switching score).
 */
export function lotResultFor(
  lot: Lot,
  outcome: DecisionOutcome,
  evaluation: Evaluation,
  approveReduced: boolean,
): LotResult {
  const accepted = outcome === 'accept';
  const result: LotResult = { accepted, approveReduced };
  if (evaluation.recommendation === 'incomplete') return result;
  const plan = standardsPlan(lot.samplingPlan, lot.quantity);
  const countSaysReject = lotOutcome(plan, evaluation.nonconforming) === 'reject';
  if (countSaysReject !== accepted) {
    result.plan = plan;
    result.nonconformingCount = evaluation.nonconforming;
  }
  return result;
}

export function applySwitching(state: InspectionState, lot: LotResult): InspectionState {
  return nextInspectionState(state, lot);
}

export function switchingNotice(before: InspectionState, after: InspectionState): SwitchingNotice {
  const changed = before.severity !== after.severity;
  const reducedAvailable = after.severity === 'normal' && after.reducedEligible;
  let message: string;
  if (changed) message = after.lastChange?.reason ?? `Inspection moves to ${after.severity}.`;
  else if (reducedAvailable) {
    message = `Reduced inspection is available (switching score ${after.switchingScore}); approve it with the next decision to switch. Inspection stays normal.`;
  } else message = `Inspection stays ${after.severity}.`;
  if (after.severity === 'discontinued' && changed) {
    message += ' New lots of this product are refused until the supplier corrects the cause.';
  }
  return { from: before.severity, to: after.severity, changed, reducedAvailable, message };
}
