import { StandardsInputError } from '../errors.js';
import { requireInteger } from '../validate.js';
import type { SamplingPlan } from './plan.js';
import { SEVERITIES } from './tables.js';

/** A product's switching state: a plan severity, or inspection discontinued (ISO 2859-1 9.4). */
export const INSPECTION_SEVERITIES = [...SEVERITIES, 'discontinued'] as const;
export type InspectionSeverity = (typeof INSPECTION_SEVERITIES)[number];

/** Switching state kept per supplier and product; plain JSON, safe to store as is. */
export interface InspectionState {
  severity: InspectionSeverity;
  /** Normal inspection: the last lots (at most 5, oldest first), true when accepted. */
  recentNormalLots: boolean[];
  /** Switching score towards reduced inspection (ISO 2859-1; the rule is from memory). */
  switchingScore: number;
  /** Tightened inspection: lots accepted in a row. */
  tightenedAcceptedInARow: number;
  /** Tightened inspection: lots not accepted since tightening began. */
  tightenedNotAccepted: number;
  /** True on normal when the score reached 30: reduced awaits the QA lead's approval. */
  reducedEligible: boolean;
  /** The last change of severity and why, in words a clerk understands. */
  lastChange: { from: InspectionSeverity; to: InspectionSeverity; reason: string } | null;
}

export interface LotResult {
  /** The lot was accepted on original inspection (not on concession or after rework). */
  accepted: boolean;
  /** With `nonconformingCount`, lets the switching score and the reduced gap be worked out. */
  plan?: SamplingPlan;
  nonconformingCount?: number;
  /** Production is steady (ISO 2859-1 condition for reduced). Default true. */
  productionSteady?: boolean;
  /** The QA lead approves a move to reduced inspection. Nothing moves to reduced without it. */
  approveReduced?: boolean;
  /** The QA lead returns reduced inspection to normal. */
  returnToNormal?: boolean;
  /** Supplier's corrective action accepted: resume discontinued inspection on tightened. */
  resumeAfterCorrectiveAction?: boolean;
}

/** Every stream starts on normal inspection (ANSI/ASQ Z1.4; ISO 2859-1). */
export function initialInspectionState(): InspectionState {
  return fresh('normal', null);
}

export function fresh(
  severity: InspectionSeverity,
  lastChange: InspectionState['lastChange'],
): InspectionState {
  return {
    severity,
    recentNormalLots: [],
    switchingScore: 0,
    tightenedAcceptedInARow: 0,
    tightenedNotAccepted: 0,
    reducedEligible: false,
    lastChange,
  };
}

export const move = (
  from: InspectionSeverity,
  to: InspectionSeverity,
  reason: string,
): InspectionState => fresh(to, { from, to, reason });

const SEVERITY_VALUES: readonly InspectionSeverity[] = [
  'normal',
  'tightened',
  'reduced',
  'discontinued',
];

export function checkState(state: InspectionState): void {
  if (
    typeof state !== 'object' ||
    state === null ||
    !SEVERITY_VALUES.includes(state.severity) ||
    !Array.isArray(state.recentNormalLots)
  ) {
    throw new StandardsInputError(
      'state',
      'state must come from initialInspectionState() or nextInspectionState().',
    );
  }
  requireInteger('state.switchingScore', state.switchingScore, 0);
  requireInteger('state.tightenedAcceptedInARow', state.tightenedAcceptedInARow, 0);
  requireInteger('state.tightenedNotAccepted', state.tightenedNotAccepted, 0);
}
