import { Alert, Button, Card, CardContent, Grid, Skeleton, Stack, Typography } from '@mui/material';
import { useSupplierScorecard } from '@/features/scorecards/api/get-supplier-scorecard';
import { AcceptanceTrendChart } from '@/features/scorecards/components/acceptance-trend-chart';
import { AreaRatioHistogram } from '@/features/scorecards/components/area-ratio-histogram';
import { ChartCard } from '@/features/scorecards/components/chart-card';
import { ProductFlags, ProductSeverityTable } from '@/features/scorecards/components/product-flags';
import { PurposeChart } from '@/features/scorecards/components/purpose-chart';
import { ScorecardSummary } from '@/features/scorecards/components/scorecard-summary';
import { WorstLotsTable } from '@/features/scorecards/components/worst-lots-table';
import type { DateRange } from '@/features/scorecards/types';

interface ViewProps {
  supplierId: number;
  range: DateRange;
  skipAnimation?: boolean;
}

/** A supplier's scorecard: figures, flags, charts, worst lots and products (loaded lazily). */
export default function SupplierScorecardView({ supplierId, range, skipAnimation }: ViewProps) {
  const query = useSupplierScorecard(supplierId, range);
  const card = query.data;
  const state = {
    loading: query.isPending,
    error: query.error,
    onRetry: () => void query.refetch(),
  };
  if (query.isError && !card) {
    return (
      <Alert
        severity="error"
        action={
          <Button color="inherit" onClick={state.onRetry}>
            Retry
          </Button>
        }
      >
        The scorecard could not be loaded: {query.error.message}
      </Alert>
    );
  }
  return (
    <Stack spacing={3}>
      {card ? (
        <>
          <ProductFlags products={card.products} />
          <ScorecardSummary scorecard={card} />
        </>
      ) : (
        <Skeleton variant="rounded" height={180} aria-label="Loading the figures" />
      )}
      <Grid container spacing={2}>
        <Grid size={{ xs: 12, lg: 6 }}>
          <ChartCard
            title="Acceptance rate by month"
            subtitle="Lots accepted on inspection ÷ lots decided; a concession is not an acceptance"
            {...state}
            empty={!card?.trend.some((p) => p.lotsDecided > 0)}
            emptyText="No lot was decided in this range."
          >
            {card ? (
              <AcceptanceTrendChart trend={card.trend} skipAnimation={skipAnimation} />
            ) : null}
          </ChartCard>
        </Grid>
        <Grid size={{ xs: 12, lg: 6 }}>
          <ChartCard
            title="Area-ratio distribution"
            subtitle="Measured copper area ÷ the label's nominal area, every non-voided reading"
            {...state}
            empty={!card?.histogram.some((b) => b.count > 0)}
            emptyText="No reading in this range."
          >
            {card ? (
              <AreaRatioHistogram bins={card.histogram} skipAnimation={skipAnimation} />
            ) : null}
          </ChartCard>
        </Grid>
        <Grid size={{ xs: 12, lg: 5 }}>
          <ChartCard
            title="Nonconforming samples by conductor purpose"
            subtitle="Samples (one cut piece of one conductor) with a non-voided reading"
            {...state}
            empty={!card?.byPurpose.length}
            emptyText="No sample was tested in this range."
          >
            {card ? <PurposeChart rows={card.byPurpose} skipAnimation={skipAnimation} /> : null}
          </ChartCard>
        </Grid>
        <Grid size={{ xs: 12, lg: 7 }}>
          <Card
            variant="outlined"
            component="section"
            aria-label="Inspection severity"
            sx={{ height: '100%' }}
          >
            <CardContent>
              <Typography variant="h2" sx={{ fontSize: '1.1rem', fontWeight: 600, mb: 1 }}>
                Inspection severity by product
              </Typography>
              {card ? <ProductSeverityTable products={card.products} /> : <Skeleton height={120} />}
            </CardContent>
          </Card>
        </Grid>
      </Grid>
      <Card variant="outlined" component="section" aria-label="Worst lots">
        <CardContent>
          <Typography variant="h2" sx={{ fontSize: '1.1rem', fontWeight: 600, mb: 1 }}>
            Worst lots
          </Typography>
          {card ? <WorstLotsTable lots={card.worstLots} /> : <Skeleton height={120} />}
        </CardContent>
      </Card>
    </Stack>
  );
}
