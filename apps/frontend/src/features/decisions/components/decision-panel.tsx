import {
  Alert,
  AlertTitle,
  Button,
  Card,
  CardContent,
  Divider,
  Stack,
  Typography,
} from '@mui/material';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useCreateDecision, type DecisionInput } from '@/features/decisions/api/create-decision';
import { useLotConcessions } from '@/features/decisions/api/concessions';
import { ConcessionCard } from '@/features/decisions/components/concession-card';
import { DecisionForm } from '@/features/decisions/components/decision-form';
import { DecisionHistory } from '@/features/decisions/components/decision-history';
import { SwitchingNoticeView } from '@/features/decisions/components/switching-notice';
import { decisionConflict } from '@/features/decisions/lib/conflict';
import {
  isWrittenDecision,
  type DecidableLot,
  type WrittenDecision,
} from '@/features/decisions/types';
import { splitServerErrors } from '@/lib/server-field-errors';
import { inSentence, labelOf, lotStatusLabels } from '@/lib/labels';
import { queryKeys } from '@/lib/query-keys';

const DECIDABLE = ['awaiting_decision', 'accepted', 'accepted_on_concession', 'rejected'];

/** The QA lead's decision on a lot, with what it did to the switching state. */
/** Shown to QA leads and admins only; the server checks the role again. */
export function DecisionPanel({ lot, meId }: { lot: DecidableLot; meId: number }) {
  const queryClient = useQueryClient();
  const decide = useCreateDecision();
  const [result, setResult] = useState<WrittenDecision | null>(null);
  const [last, setLast] = useState<DecisionInput | null>(null);
  const [revising, setRevising] = useState(false);
  const [asked, setAsked] = useState(false);
  // While a concession waits for its second approval, nothing else is decided on the lot.
  const waiting = useLotConcessions(lot.id).data?.some((c) => c.status === 'pending') ?? false;
  const conflict = decisionConflict(decide.error);
  const decided = lot.status !== 'awaiting_decision';
  const formErrors =
    decide.isError && !conflict
      ? splitServerErrors(decide.error, [
          'outcome',
          'reason',
          'concession',
          'concession.scope',
          'concession.quantity',
          'concession.expiresOn',
        ]).formErrors
      : [];

  const send = async (input: DecisionInput, version: number, approveReduced?: boolean) => {
    setResult(null);
    setAsked(false);
    const answer = await decide.mutateAsync({ lotId: lot.id, version, ...input, approveReduced });
    if (!isWrittenDecision(answer)) {
      // A concession against a reject waits for a second QA lead or an admin.
      setAsked(true);
      setRevising(false);
      return;
    }
    setLast(input);
    setResult(answer);
    setRevising(false);
  };

  const reload = () => {
    decide.reset();
    void queryClient.invalidateQueries({ queryKey: queryKeys.lots.detail(lot.id) });
  };

  return (
    <Card aria-label="Decision panel">
      <CardContent>
        <Stack spacing={2}>
          <Typography variant="h4" component="h2">
            Decision
          </Typography>
          <Typography variant="body2" color="text.secondary">
            {lot.evaluation.samplesTested} of {lot.evaluation.samplesPlanned} units tested,{' '}
            {lot.evaluation.nonconforming} nonconforming, {lot.evaluation.inconclusive}{' '}
            inconclusive. Recommendation: <strong>{lot.evaluation.recommendation}</strong>.
          </Typography>
          <ConcessionCard lotId={lot.id} meId={meId} />
          {asked && (
            <Alert severity="info">
              Concession asked for. The lot stays held until a second QA lead or an admin approves
              it; they see it on this page.
            </Alert>
          )}
          {result && (
            <SwitchingNoticeView
              result={result}
              approving={decide.isPending}
              onApproveReduced={() => {
                if (last) void send(last, result.lot.version, true).catch(() => undefined);
              }}
            />
          )}
          {conflict && (
            <Alert
              severity="warning"
              action={
                <Button color="inherit" onClick={reload}>
                  Reload
                </Button>
              }
            >
              <AlertTitle>Someone decided this lot first</AlertTitle>
              The lot is now {inSentence(labelOf(lotStatusLabels, conflict.status))} (version{' '}
              {conflict.version}). Reload to see their decision before you decide again.
            </Alert>
          )}
          {DECIDABLE.includes(lot.status) && !conflict && !waiting && (!decided || revising) && (
            <DecisionForm
              key={lot.version}
              recommendation={lot.evaluation.recommendation}
              lotQuantity={lot.quantity}
              unit={lot.unit}
              submitLabel={decided ? 'Record the new decision' : 'Record the decision'}
              formErrors={formErrors}
              onDecide={(input) => send(input, lot.version)}
            />
          )}
          {DECIDABLE.includes(lot.status) && !conflict && !waiting && decided && !revising && (
            <div>
              <Button variant="outlined" onClick={() => setRevising(true)}>
                Supersede the decision
              </Button>
              <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
                A new decision is added on top; the earlier one stays in the history.
              </Typography>
            </div>
          )}
          {!DECIDABLE.includes(lot.status) && (
            <Alert severity="info">
              {lot.status === 'returned'
                ? 'This lot has gone back to the supplier; it cannot be decided again.'
                : 'The decision is taken once every planned unit has a reading.'}
            </Alert>
          )}
          <Divider />
          <DecisionHistory lotId={lot.id} />
        </Stack>
      </CardContent>
    </Card>
  );
}
