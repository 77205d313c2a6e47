import { Alert, Button, Stack, Step, StepLabel, Stepper } from '@mui/material';
import {
  RETURN_PATH,
  returnSteps,
  stepLabels,
  type ReturnStep,
} from '@/features/returns/lib/return-steps';
import { returnStatusLabels, type ReturnStatus } from '@/features/returns/types';

interface ReturnStatusStepperProps {
  status: ReturnStatus;
  busy: ReturnStep | null;
  onStep: (step: ReturnStep) => void;
}

/** draft → notice e-mailed → shipped → acknowledged → credited → closed, offering the next steps. */
export function ReturnStatusStepper({ status, busy, onStep }: ReturnStatusStepperProps) {
  if (status === 'cancelled') {
    return <Alert severity="info">This return was cancelled; its lots are free again.</Alert>;
  }
  const active = RETURN_PATH.indexOf(status);
  return (
    <Stack spacing={2}>
      <Stepper activeStep={active} alternativeLabel aria-label="Return status">
        {RETURN_PATH.map((s, i) => (
          <Step key={s} completed={i < active || status === 'closed'}>
            <StepLabel>{returnStatusLabels[s]}</StepLabel>
          </Step>
        ))}
      </Stepper>
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', justifyContent: 'flex-end' }}>
        {returnSteps(status).map((step) => (
          <Button
            key={step}
            variant={step === 'cancel' ? 'outlined' : 'contained'}
            color={step === 'cancel' ? 'error' : 'primary'}
            loading={busy === step}
            onClick={() => onStep(step)}
          >
            {stepLabels[step]}
          </Button>
        ))}
      </Stack>
    </Stack>
  );
}
