import { Box, Skeleton, Stack, Typography } from '@mui/material';
import { lazy, Suspense } from 'react';
import { CsvDownloadButton } from '@/components/data-table/csv-download-button';
import { SectionBoundary } from '@/components/section-boundary';
import { DateRangePicker } from '@/features/scorecards/components/date-range-picker';
import { useScorecardRange } from '@/features/scorecards/lib/use-scorecard-range';

// x-charts is heavy: the table with its sparklines loads in its own chunk.
const ScorecardRankingTable = lazy(
  () => import('@/features/scorecards/components/scorecard-ranking-table'),
);

export function ScorecardsRoute() {
  const [range, setRange] = useScorecardRange();
  return (
    <Stack spacing={2}>
      <Stack
        direction={{ xs: 'column', md: 'row' }}
        spacing={2}
        sx={{ justifyContent: 'space-between' }}
      >
        <div>
          <Typography variant="h1">Scorecards</Typography>
          <Typography color="text.secondary">
            Suppliers ranked worst first by lot acceptance, from lots received in the range. Open a
            supplier for its charts and worst lots.
          </Typography>
        </div>
        <Box sx={{ flexShrink: 0, whiteSpace: 'nowrap' }}>
          <CsvDownloadButton
            path="/scorecards/export.csv"
            query={{ ...range }}
            filename={`scorecards-${range.from}-${range.to}.csv`}
          />
        </Box>
      </Stack>
      <DateRangePicker value={range} onChange={setRange} />
      <SectionBoundary name="supplier ranking">
        <Suspense
          fallback={<Skeleton variant="rounded" height={240} aria-label="Loading the ranking" />}
        >
          <ScorecardRankingTable range={range} />
        </Suspense>
      </SectionBoundary>
    </Stack>
  );
}
