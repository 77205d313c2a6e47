import { Button, Stack, Step, StepLabel, Stepper } from '@mui/material';
import { nextReturnStatus, nextStepLabels } from '@/features/returns/lib/return-steps';
import { RETURN_STATUSES, returnStatusLabels, type ReturnStatus } from '@/features/returns/types';

interface ReturnStatusStepperProps {
  status: ReturnStatus;
  busy: boolean;
  onAdvance: (next: ReturnStatus) => void;
}

/** draft → sent → acknowledged → closed, offering only the next step. */
export function ReturnStatusStepper({ status, busy, onAdvance }: ReturnStatusStepperProps) {
  const next = nextReturnStatus(status);
  const active = RETURN_STATUSES.indexOf(status);
  return (
    <Stack
      direction={{ xs: 'column', md: 'row' }}
      spacing={2}
      sx={{ alignItems: { md: 'center' } }}
    >
      <Stepper activeStep={active} sx={{ flex: 1 }} aria-label="Return status">
        {RETURN_STATUSES.map((s, i) => (
          <Step key={s} completed={i < active || status === 'closed'}>
            <StepLabel>{returnStatusLabels[s]}</StepLabel>
          </Step>
        ))}
      </Stepper>
      {next && (
        <Button variant="contained" loading={busy} onClick={() => onAdvance(next)}>
          {nextStepLabels[status]}
        </Button>
      )}
    </Stack>
  );
}
