import { StandardsInputError } from '../errors.js';
import { acceptedAtTighterAql, lotOutcome, type LotOutcome } from './plan.js';
import { checkState, move, type InspectionState, type LotResult } from './switching-state.js';

export {
  INSPECTION_SEVERITIES,
  initialInspectionState,
  type InspectionSeverity,
  type InspectionState,
  type LotResult,
} from './switching-state.js';

/** Switching limits (ANSI/ASQ Z1.4; ISO 2859-1 clause text; REFERENCE §6). */
const WINDOW = 5; // normal → tightened: 2 not accepted in 5 or fewer consecutive lots
const NOT_ACCEPTED_TO_TIGHTEN = 2;
const ACCEPTED_TO_RELAX = 5; // tightened → normal: 5 consecutive lots accepted
const NOT_ACCEPTED_TO_DISCONTINUE = 5; // discontinue at 5 lots not accepted on tightened
const SCORE_FOR_REDUCED = 30; // ISO 2859-1 switching score (from memory)

/**
 * Switching score after one lot on normal inspection (ISO 2859-1; rule from memory): with
 * Ac ≥ 2 add 3 if the lot would also pass at the AQL one step tighter, else reset; with
 * Ac 0 or 1 add 2 if accepted, else reset. Without plan and count the score is unchanged.
 */
function nextScore(score: number, lot: LotResult): number {
  if (!lot.accepted) return 0;
  if (lot.plan === undefined || lot.nonconformingCount === undefined) return score;
  if (lot.plan.accept >= 2)
    return acceptedAtTighterAql(lot.plan, lot.nonconformingCount) ? score + 3 : 0;
  return score + 2;
}

/** The state after one more lot. Never goes from reduced straight to tightened. */
export function nextInspectionState(state: InspectionState, lot: LotResult): InspectionState {
  checkState(state);
  if (typeof lot !== 'object' || lot === null || typeof lot.accepted !== 'boolean') {
    throw new StandardsInputError('accepted', 'Say whether the lot was accepted (true or false).');
  }
  let outcome: LotOutcome | undefined;
  if (lot.plan !== undefined && lot.nonconformingCount !== undefined) {
    outcome = lotOutcome(lot.plan, lot.nonconformingCount);
    if ((outcome === 'reject') === lot.accepted) {
      throw new StandardsInputError(
        'accepted',
        `A count of ${lot.nonconformingCount} means the lot was ${outcome === 'reject' ? 'rejected' : 'accepted'}.`,
      );
    }
  }
  const { severity } = state;
  if (severity === 'discontinued') {
    if (lot.resumeAfterCorrectiveAction === true) {
      return move(
        'discontinued',
        'tightened',
        "The supplier's corrective action was accepted: inspection resumes on tightened.",
      );
    }
    return { ...state };
  }
  if (severity === 'tightened') {
    if (!lot.accepted) {
      const notAccepted = state.tightenedNotAccepted + 1;
      if (notAccepted >= NOT_ACCEPTED_TO_DISCONTINUE) {
        return move(
          'tightened',
          'discontinued',
          `${notAccepted} lots not accepted on tightened inspection: inspection is discontinued and the supplier goes on hold until corrective action.`,
        );
      }
      return { ...state, tightenedNotAccepted: notAccepted, tightenedAcceptedInARow: 0 };
    }
    const run = state.tightenedAcceptedInARow + 1;
    if (run >= ACCEPTED_TO_RELAX) {
      return move(
        'tightened',
        'normal',
        `${run} lots in a row accepted on tightened inspection: back to normal.`,
      );
    }
    return { ...state, tightenedAcceptedInARow: run };
  }
  if (severity === 'reduced') {
    if (!lot.accepted || outcome === 'accept_and_return_to_normal') {
      return move(
        'reduced',
        'normal',
        lot.accepted
          ? 'The count fell between the accept and reject numbers on reduced inspection: back to normal.'
          : 'A lot was not accepted on reduced inspection: back to normal.',
      );
    }
    if (lot.productionSteady === false)
      return move('reduced', 'normal', 'Production is irregular: back to normal inspection.');
    if (lot.returnToNormal === true)
      return move('reduced', 'normal', 'The QA lead returned the stream to normal inspection.');
    return { ...state };
  }
  // normal
  const recent = [...state.recentNormalLots, lot.accepted].slice(-WINDOW);
  const notAccepted = recent.filter((a) => !a).length;
  if (notAccepted >= NOT_ACCEPTED_TO_TIGHTEN) {
    return move(
      'normal',
      'tightened',
      `${notAccepted} of the last ${recent.length} lots were not accepted: inspection is tightened.`,
    );
  }
  const switchingScore = nextScore(state.switchingScore, lot);
  const reducedEligible = switchingScore >= SCORE_FOR_REDUCED && lot.productionSteady !== false;
  if (reducedEligible && lot.approveReduced === true) {
    return move(
      'normal',
      'reduced',
      `Switching score ${switchingScore} (30 needed), production steady and the QA lead approved: reduced inspection.`,
    );
  }
  return { ...state, recentNormalLots: recent, switchingScore, reducedEligible };
}

/**
 * The QA lead approves reduced inspection between lots, once the stream is eligible
 * (normal, switching score 30 or more, production steady).
 */
export function approveReducedInspection(state: InspectionState): InspectionState {
  checkState(state);
  if (state.severity !== 'normal' || !state.reducedEligible) {
    throw new StandardsInputError(
      'state',
      'Reduced inspection needs normal inspection with a switching score of 30 or more.',
    );
  }
  return move(
    'normal',
    'reduced',
    `Switching score ${state.switchingScore} (30 needed), production steady and the QA lead approved: reduced inspection.`,
  );
}
