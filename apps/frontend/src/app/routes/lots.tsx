import { Stack, Typography } from '@mui/material';
import { SectionBoundary } from '@/components/section-boundary';
import { LotsTable } from '@/features/lots/components/lots-table';

export function LotsRoute() {
  return (
    <Stack spacing={2}>
      <div>
        <Typography variant="h1">Lots</Typography>
        <Typography color="text.secondary">
          Every delivery received, newest first. Filter, sort and export.
        </Typography>
      </div>
      <SectionBoundary name="lot list">
        <LotsTable />
      </SectionBoundary>
    </Stack>
  );
}
