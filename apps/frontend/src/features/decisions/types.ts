import {
  type DecisionOutcome,
  type InspectionSeverity,
  type Recommendation,
} from '@gaugeproof/api-types';
/** Shapes of docs/api-conventions.md the decision panel works with. */
export { type DecisionOutcome, type InspectionSeverity, type Recommendation };

export interface Decision {
  id: number;
  outcome: DecisionOutcome;
  recommendation: Recommendation;
  reason: string;
  decidedBy: { id: number; name: string };
  decidedAt: string;
  lotVersion: number;
  ncrNumber: string | null;
}

export interface EvaluationCounts {
  samplesPlanned: number;
  samplesTested: number;
  nonconforming: number;
  inconclusive: number;
  recommendation: Recommendation;
  message: string;
}

/** What the panel needs of LotDetail. */
export interface DecidableLot {
  id: number;
  status: string;
  version: number;
  quantity: number;
  unit: string;
  evaluation: EvaluationCounts;
  ncrNumber: string | null;
}

/** What a decision did to the product's ISO 2859-1 switching state. */
export interface SwitchingNotice {
  from: InspectionSeverity;
  to: InspectionSeverity;
  changed: boolean;
  reducedAvailable: boolean;
  message: string;
}

export interface DecisionResult {
  /** True when a concession was asked for and waits for a second approval (nothing decided). */
  pendingApproval?: boolean;
  decision: Decision;
  lot: { id: number; status: string; version: number };
  evaluation: EvaluationCounts;
  ncrNumber: string | null;
  switching: SwitchingNotice;
}

export const outcomeLabels: Record<DecisionOutcome, string> = {
  accept: 'Accept',
  accept_on_concession: 'Accept on concession',
  reject: 'Reject',
};
