import {
  type Decision,
  type DecisionOutcome,
  type DecisionResult,
  type InspectionSeverity,
  type LotDetail,
  type Recommendation,
  type SwitchingNotice,
} from '@gaugeproof/api-types';
/** The decision panel's enums and shapes are the contract's (libs/api-types). */
export { type DecisionOutcome, type InspectionSeverity, type Recommendation };
export type {
  Decision,
  DecisionResult,
  Evaluation as EvaluationCounts,
  SwitchingNotice,
} from '@gaugeproof/api-types';

/** What the panel needs of LotDetail. */
export type DecidableLot = Pick<
  LotDetail,
  'id' | 'status' | 'version' | 'quantity' | 'unit' | 'evaluation' | 'ncrNumber'
>;

/** A decision the server wrote (not a concession waiting for its second approval). */
export type WrittenDecision = DecisionResult & { decision: Decision; switching: SwitchingNotice };

export const isWrittenDecision = (r: DecisionResult): r is WrittenDecision =>
  !r.pendingApproval && r.decision !== null && r.switching !== null;

export const outcomeLabels: Record<DecisionOutcome, string> = {
  accept: 'Accept',
  accept_on_concession: 'Accept on concession',
  reject: 'Reject',
};
