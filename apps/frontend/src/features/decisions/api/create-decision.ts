import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { reasonError } from '@/features/decisions/lib/reason-rule';
import type { DecisionOutcome, DecisionResult, Recommendation } from '@/features/decisions/types';
import { queryKeys } from '@/lib/query-keys';

const OUTCOMES = ['accept', 'accept_on_concession', 'reject'] as const;

/** The decision form; the reason rule depends on the evaluation's recommendation. */
export const decisionSchema = (recommendation: Recommendation) =>
  z
    .object({
      // '' while nothing is chosen yet; the pipe turns it into the message.
      outcome: z.enum(['', ...OUTCOMES]).pipe(z.enum(OUTCOMES, 'Choose an outcome.')),
      reason: z.string(),
    })
    .superRefine((value, ctx) => {
      const message = reasonError(value.outcome, recommendation, value.reason);
      if (message) ctx.addIssue({ code: 'custom', path: ['reason'], message });
    });
export type DecisionInput = { outcome: DecisionOutcome; reason: string };

export interface DecisionRequest extends DecisionInput {
  lotId: number;
  /** The lot version the QA lead looked at: a stale one answers 409. */
  version: number;
  approveReduced?: boolean;
}

export const createDecision = ({ lotId, ...body }: DecisionRequest) =>
  api.post<DecisionResult>(`/lots/${lotId}/decisions`, { ...body, reason: body.reason.trim() });

export function useCreateDecision() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDecision,
    meta: { inlineErrors: true },
    // The lot, its timeline, the lists and Today all change with a decision.
    onSettled: () => queryClient.invalidateQueries({ queryKey: queryKeys.lots.all }),
  });
}
