import { z } from 'zod';
import { api } from '@/lib/api-client';
import { reasonError } from '@/features/decisions/lib/reason-rule';
import type { DecisionOutcome, DecisionResult, Recommendation } from '@/features/decisions/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { parseDecimal, TEXT_MIN } from '@gaugeproof/api-types';

const OUTCOMES = ['accept', 'accept_on_concession', 'reject'] as const;

/** The decision form; the reason rule depends on the evaluation's recommendation. */
export const decisionSchema = (recommendation: Recommendation, lotQuantity = Infinity) =>
  z
    .object({
      // '' while nothing is chosen yet; the pipe turns it into the message.
      outcome: z.enum(['', ...OUTCOMES]).pipe(z.enum(OUTCOMES, 'Choose an outcome.')),
      reason: z.string(),
      // The concession's terms, asked for only with "Accept on concession".
      scope: z.string(),
      quantity: z.string(),
      expiresOn: z.string(),
    })
    .superRefine((value, ctx) => {
      const message = reasonError(value.outcome, recommendation, value.reason);
      if (message) ctx.addIssue({ code: 'custom', path: ['reason'], message });
      if (value.outcome !== 'accept_on_concession') return;
      if (value.scope.trim().length < TEXT_MIN.answer)
        ctx.addIssue({
          code: 'custom',
          path: ['scope'],
          message: `Say in at least ${TEXT_MIN.answer} characters what the material may be used for.`,
        });
      const q = parseDecimal(value.quantity);
      if (q === null || q <= 0)
        ctx.addIssue({ code: 'custom', path: ['quantity'], message: 'Give a quantity above 0.' });
      else if (q > lotQuantity)
        ctx.addIssue({
          code: 'custom',
          path: ['quantity'],
          message: `At most the lot's ${lotQuantity}.`,
        });
      const today = new Date().toISOString().slice(0, 10);
      if (!/^\d{4}-\d{2}-\d{2}$/.test(value.expiresOn))
        ctx.addIssue({
          code: 'custom',
          path: ['expiresOn'],
          message: 'Pick the last day it holds.',
        });
      else if (value.expiresOn < today)
        ctx.addIssue({ code: 'custom', path: ['expiresOn'], message: 'Today or later.' });
    });
export type DecisionFormValues = z.infer<ReturnType<typeof decisionSchema>>;
export type ConcessionTerms = { scope: string; quantity: number; expiresOn: string };
export type DecisionInput = {
  outcome: DecisionOutcome;
  reason: string;
  concession?: ConcessionTerms;
};

/** What the form sends: the terms only with a concession. */
export function decisionInputOf(v: DecisionFormValues): DecisionInput {
  return v.outcome === 'accept_on_concession'
    ? {
        outcome: v.outcome,
        reason: v.reason,
        concession: {
          scope: v.scope.trim(),
          quantity: parseDecimal(v.quantity) ?? Number.NaN,
          expiresOn: v.expiresOn,
        },
      }
    : { outcome: v.outcome, reason: v.reason };
}

export interface DecisionRequest extends DecisionInput {
  lotId: number;
  /** The lot version the QA lead looked at: a stale one answers 409. */
  version: number;
  approveReduced?: boolean;
}

export const createDecision = ({ lotId, ...body }: DecisionRequest) =>
  api.post<DecisionResult>(`/lots/${lotId}/decisions`, { ...body, reason: body.reason.trim() });

export function useCreateDecision() {
  return useWriteMutation(createDecision, {
    refresh: [queryKeys.lots.all],
    // The lot, its timeline, the lists and Today all change with a decision.
    refreshOnError: true,
  });
}
