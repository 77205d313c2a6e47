import { Stack, Typography } from '@mui/material';
import { SectionBoundary } from '@/components/section-boundary';
import { useSessionUser } from '@/features/auth/auth-context';
import { InstrumentsPanel } from '@/features/instruments/components/instruments-panel';

export function InstrumentsRoute() {
  const user = useSessionUser();
  const canWrite = user.role === 'qa_lead' || user.role === 'admin';
  return (
    <Stack spacing={2}>
      <div>
        <Typography variant="h1">Instruments</Typography>
        <Typography color="text.secondary">
          The balances, micrometers, rules and meters readings are taken with, and when each is due
          for calibration.
        </Typography>
      </div>
      <SectionBoundary name="instrument register">
        <InstrumentsPanel canWrite={canWrite} />
      </SectionBoundary>
    </Stack>
  );
}
