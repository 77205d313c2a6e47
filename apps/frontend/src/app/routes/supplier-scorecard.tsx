import ArrowBackOutlined from '@mui/icons-material/ArrowBackOutlined';
import { Box, Button, Skeleton, Stack, Typography } from '@mui/material';
import { lazy, Suspense } from 'react';
import { Link as RouterLink, useParams } from 'react-router';
import { CsvDownloadButton } from '@/components/data-table/csv-download-button';
import { SafetyCaution } from '@/components/safety-caution';
import { SectionBoundary } from '@/components/section-boundary';
import { paths } from '@/config/paths';
import { useSupplierScorecard } from '@/features/scorecards/api/get-supplier-scorecard';
import { DateRangePicker } from '@/features/scorecards/components/date-range-picker';
import { SupplierStatusChip } from '@/features/scorecards/components/supplier-status-chip';
import { useScorecardRange } from '@/features/scorecards/lib/use-scorecard-range';
import { NotFoundRoute } from '@/app/routes/not-found';

// The charts (x-charts) load in their own chunk.
const SupplierScorecardView = lazy(
  () => import('@/features/scorecards/components/supplier-scorecard-view'),
);

export function SupplierScorecardRoute() {
  const supplierId = Number(useParams().supplierId);
  if (!Number.isInteger(supplierId) || supplierId < 1) return <NotFoundRoute />;
  return <SupplierScorecardPage supplierId={supplierId} />;
}

function SupplierScorecardPage({ supplierId }: { supplierId: number }) {
  const [range, setRange] = useScorecardRange();
  const card = useSupplierScorecard(supplierId, range).data;
  return (
    <Stack spacing={2}>
      <div>
        <Button
          component={RouterLink}
          to={`${paths.scorecards.getHref()}?from=${range.from}&to=${range.to}`}
          startIcon={<ArrowBackOutlined />}
          size="small"
        >
          All scorecards
        </Button>
      </div>
      <Stack
        direction={{ xs: 'column', md: 'row' }}
        spacing={2}
        sx={{ justifyContent: 'space-between' }}
      >
        <div>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
            <Typography variant="h1">{card ? card.name : 'Supplier scorecard'}</Typography>
            {card ? <SupplierStatusChip status={card.status} /> : null}
          </Stack>
          <Typography color="text.secondary">
            {card ? `${card.code} · ` : ''}Lots received {range.from} to {range.to}, both days
            included. Every figure comes from the lots and their non-voided readings.
          </Typography>
        </div>
        <Box sx={{ flexShrink: 0, whiteSpace: 'nowrap' }}>
          <CsvDownloadButton
            path={`/suppliers/${supplierId}/scorecard/export.csv`}
            query={{ ...range }}
            filename={`scorecard-${card?.code ?? supplierId}-${range.from}-${range.to}.csv`}
          />
        </Box>
      </Stack>
      <DateRangePicker value={range} onChange={setRange} />
      <SafetyCaution />
      <SectionBoundary name="supplier scorecard">
        <Suspense
          fallback={<Skeleton variant="rounded" height={400} aria-label="Loading the charts" />}
        >
          <SupplierScorecardView supplierId={supplierId} range={range} />
        </Suspense>
      </SectionBoundary>
    </Stack>
  );
}
