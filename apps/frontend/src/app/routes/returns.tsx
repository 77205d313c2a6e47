import { Stack, Typography } from '@mui/material';
import { SectionBoundary } from '@/components/section-boundary';
import { ReturnsPanel } from '@/features/returns/components/returns-panel';

export function ReturnsRoute() {
  return (
    <Stack spacing={2}>
      <div>
        <Typography variant="h1">Returns</Typography>
        <Typography color="text.secondary">
          Rejected lots going back to their supplier, with the evidence pack and the chargeback.
        </Typography>
      </div>
      <SectionBoundary name="return list">
        <ReturnsPanel />
      </SectionBoundary>
    </Stack>
  );
}
