import { Alert, AlertTitle, Button, Stack, TextField, Typography } from '@mui/material';
import { useState } from 'react';
import {
  useLotConcessions,
  useReviewConcession,
  type Concession,
} from '@/features/decisions/api/concessions';
import { isoDayOf } from '@/lib/dates';
import { errorMessage } from '@/lib/query-client';
import { TEXT_MIN } from '@gaugeproof/api-types';
import { countOf } from '@/lib/counts';

/** The terms in one line: what for, how much, until when. */
export function concessionTerms(c: Concession): string {
  return `Use only for: ${c.scope} · ${countOf(c.quantity, c.unit)} · until ${c.expiresOn}`;
}

function Pending({ c, meId }: { c: Concession; meId: number }) {
  const approve = useReviewConcession('approve');
  const refuse = useReviewConcession('refuse');
  const [refusing, setRefusing] = useState(false);
  const [note, setNote] = useState('');
  const mine = c.requestedBy.id === meId;
  const noteError =
    note.trim().length < TEXT_MIN.answer
      ? `Say in at least ${TEXT_MIN.answer} characters why.`
      : null;
  const error = approve.error ?? refuse.error;
  return (
    <Alert severity="warning" role="region" aria-label="Concession waiting for approval">
      <AlertTitle>Concession waiting for a second approval</AlertTitle>
      <Stack spacing={1}>
        <Typography variant="body2">
          {c.requestedBy.name} asked on {isoDayOf(c.requestedAt)} to accept this lot against its
          reject recommendation. {concessionTerms(c)}.
        </Typography>
        <Typography variant="body2">Reason: {c.reason}</Typography>
        <Typography variant="body2">
          The product's policy wants a second QA lead or an admin to approve it; until then the lot
          stays held.
        </Typography>
        {mine ? (
          <Typography variant="body2" sx={{ fontWeight: 600 }}>
            You asked for it: another QA lead or an admin approves it. You may withdraw it.
          </Typography>
        ) : (
          <div>
            <Button
              variant="contained"
              color="warning"
              loading={approve.isPending}
              disabled={refuse.isPending}
              onClick={() => approve.mutate({ id: c.id, version: c.version })}
            >
              Approve the concession
            </Button>
          </div>
        )}
        {!refusing ? (
          <div>
            <Button color="inherit" onClick={() => setRefusing(true)}>
              {mine ? 'Withdraw it…' : 'Refuse it…'}
            </Button>
          </div>
        ) : (
          <Stack spacing={1}>
            <TextField
              label={mine ? 'Why you withdraw it' : 'Why you refuse it'}
              size="small"
              multiline
              minRows={2}
              value={note}
              onChange={(e) => setNote(e.target.value)}
              error={note.length > 0 && !!noteError}
              helperText={note.length > 0 && noteError ? noteError : 'Kept with the lot.'}
            />
            <div>
              <Button
                variant="outlined"
                color="inherit"
                disabled={!!noteError}
                loading={refuse.isPending}
                onClick={() => refuse.mutate({ id: c.id, version: c.version, note })}
              >
                {mine ? 'Withdraw the concession' : 'Refuse the concession'}
              </Button>
            </div>
          </Stack>
        )}
        {error && <Alert severity="error">{errorMessage(error)}</Alert>}
      </Stack>
    </Alert>
  );
}

/**
 * A lot's concessions: one waiting for approval (with approve / refuse), and the terms of
 * the one in force. Shown on the decision panel.
 */
export function ConcessionCard({ lotId, meId }: { lotId: number; meId: number }) {
  const list = useLotConcessions(lotId);
  if (!list.data?.length) return null;
  const pending = list.data.find((c) => c.status === 'pending');
  const inForce = list.data.find((c) => c.status === 'approved');
  return (
    <Stack spacing={1}>
      {pending && <Pending c={pending} meId={meId} />}
      {inForce && !pending && (
        <Alert severity={inForce.expired ? 'error' : 'info'} aria-label="Concession in force">
          <AlertTitle>
            {inForce.expired ? 'Concession expired' : 'Accepted on concession'}
          </AlertTitle>
          {concessionTerms(inForce)}. Approved by {inForce.reviewedBy?.name ?? '—'}
          {inForce.reviewedAt ? ` on ${isoDayOf(inForce.reviewedAt)}` : ''}
          {inForce.needsSecondApproval ? ` (asked by ${inForce.requestedBy.name})` : ''}.
        </Alert>
      )}
    </Stack>
  );
}
