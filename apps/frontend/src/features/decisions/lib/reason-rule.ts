import { TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import type { DecisionOutcome, Recommendation } from '@/features/decisions/types';

/** Shortest reason for a decision against the recommendation or on concession (the contract's). */
export const MIN_REASON_LENGTH = TEXT_MIN.decisionReason;

/**
 * A concession, or an outcome other than the recommendation (an "incomplete" evaluation
 * included), needs a written reason; the server applies the same rule.
 */
export function reasonRequired(outcome: DecisionOutcome, recommendation: Recommendation): boolean {
  return outcome === 'accept_on_concession' || outcome !== recommendation;
}

/** Why the reason is needed, in the QA lead's words; null when it is optional. */
export function reasonRequirement(
  outcome: DecisionOutcome,
  recommendation: Recommendation,
): string | null {
  if (!reasonRequired(outcome, recommendation)) return null;
  if (outcome === 'accept_on_concession') return 'A concession needs a reason';
  if (recommendation === 'incomplete') return 'The inspection is incomplete: give a reason';
  return `This goes against the recommendation (${recommendation}): give a reason`;
}

/** The validation message for a reason, or null when it will do. */
export function reasonError(
  outcome: DecisionOutcome,
  recommendation: Recommendation,
  reason: string,
): string | null {
  const length = reason.trim().length;
  if (length > TEXT_MAX.long) return `At most ${TEXT_MAX.long} characters.`;
  if (!reasonRequired(outcome, recommendation) || length >= MIN_REASON_LENGTH) return null;
  return `${reasonRequirement(outcome, recommendation)} of at least ${MIN_REASON_LENGTH} characters (${length} so far).`;
}
