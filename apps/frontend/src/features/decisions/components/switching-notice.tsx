import {
  Alert,
  AlertTitle,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
} from '@mui/material';
import { useState } from 'react';
import type { WrittenDecision } from '@/features/decisions/types';

interface SwitchingNoticeProps {
  result: WrittenDecision;
  approving: boolean;
  onApproveReduced: () => void;
}

const titleOf = (r: WrittenDecision) => {
  const s = r.switching;
  if (s.changed && s.to === 'discontinued') return 'Inspection discontinued for this product';
  if (s.changed) return `Inspection moves from ${s.from} to ${s.to}`;
  return 'Reduced inspection is available';
};

/** What the decision did: the NCR of a reject and the ISO 2859-1 switching notice. */
export function SwitchingNoticeView({ result, approving, onApproveReduced }: SwitchingNoticeProps) {
  const [confirming, setConfirming] = useState(false);
  const s = result.switching;
  const severity =
    s.to === 'discontinued' || s.to === 'tightened'
      ? 'error'
      : s.changed || s.reducedAvailable
        ? 'warning'
        : 'info';
  return (
    <>
      {result.ncrNumber && (
        <Alert severity="error" variant="filled" role="status" sx={{ mb: 1 }}>
          Rejected. Nonconformance record <strong>{result.ncrNumber}</strong> is open.
        </Alert>
      )}
      <Alert
        severity={severity}
        variant={s.changed ? 'filled' : 'standard'}
        role="status"
        aria-label="Switching notice"
        action={
          s.reducedAvailable ? (
            <Button color="inherit" onClick={() => setConfirming(true)} loading={approving}>
              Approve reduced inspection
            </Button>
          ) : undefined
        }
      >
        {s.changed || s.reducedAvailable ? <AlertTitle>{titleOf(result)}</AlertTitle> : null}
        {s.message}
      </Alert>
      <Dialog open={confirming} onClose={() => setConfirming(false)}>
        <DialogTitle>Approve reduced inspection?</DialogTitle>
        <DialogContent>
          <DialogContentText>
            Later lots of this product will be inspected on the reduced plan (fewer units cut) until
            a lot fails or production becomes irregular (ISO 2859-1 switching rules). The decision
            is sent again with your approval and recorded on the timeline.
          </DialogContentText>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setConfirming(false)}>Cancel</Button>
          <Button
            variant="contained"
            onClick={() => {
              setConfirming(false);
              onApproveReduced();
            }}
          >
            Approve reduced inspection
          </Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
