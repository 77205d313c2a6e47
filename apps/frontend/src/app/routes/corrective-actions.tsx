import { Stack, Typography } from '@mui/material';
import { SectionBoundary } from '@/components/section-boundary';
import { CorrectiveActionsPanel } from '@/features/corrective-actions/components/corrective-actions-panel';

export function CorrectiveActionsRoute() {
  return (
    <Stack spacing={2}>
      <div>
        <Typography variant="h1">Corrective actions</Typography>
        <Typography color="text.secondary">
          Supplier corrective action requests (SCAR): the problem, the supplier's response and its
          verification. Overdue responses are marked.
        </Typography>
      </div>
      <SectionBoundary name="corrective action list">
        <CorrectiveActionsPanel />
      </SectionBoundary>
    </Stack>
  );
}
