import { Stack, Typography } from '@mui/material';
import { SectionBoundary } from '@/components/section-boundary';
import { ReferencePanel } from '@/features/reference/components/reference-panel';

export function ReferenceRoute() {
  return (
    <Stack spacing={2} sx={{ maxWidth: 1100 }}>
      <div>
        <Typography variant="h1">Reference</Typography>
        <Typography color="text.secondary">
          Gauge tables and calculators, in the units of your preference (user menu).
        </Typography>
      </div>
      <SectionBoundary name="reference">
        <ReferencePanel />
      </SectionBoundary>
    </Stack>
  );
}
