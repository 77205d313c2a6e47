import { Grid, Paper, Typography } from '@mui/material';
import {
  formatDays,
  formatMoneyTotals,
  formatPercent,
  formatWhole,
  NONE,
} from '@/features/scorecards/lib/format';
import type { ScorecardRow } from '@/features/scorecards/types';

interface Tile {
  label: string;
  value: string;
  detail: string;
}

function tiles(s: ScorecardRow): Tile[] {
  return [
    {
      label: 'Lot acceptance',
      value: formatPercent(s.acceptanceRate),
      detail: `${s.lotsAccepted} of ${s.lotsAccepted + s.lotsAcceptedOnConcession + s.lotsRejected} decided lots accepted on inspection; ${s.lotsAcceptedOnConcession} on concession, ${s.lotsRejected} rejected, ${s.lotsPending} undecided`,
    },
    {
      label: 'Lots received',
      value: formatWhole(s.lotsReceived),
      detail: 'by received date, both ends of the range included',
    },
    {
      label: 'Nonconforming units',
      value: `${s.nonconformingUnits} of ${s.unitsTested}`,
      detail: `${formatPercent(s.unitNonconformingRate)} (${formatWhole(s.dppm)} per million units); a kit with one short conductor is one unit; ${s.nonconformingSamples} of ${s.samplesTested} conductors`,
    },
    {
      label: 'Area ratio by method',
      value: s.areaRatioByMethod.length
        ? s.areaRatioByMethod.map((m) => formatPercent(m.meanAreaRatio)).join(' · ')
        : NONE,
      detail: s.areaRatioByMethod.length
        ? `mean of ${s.areaRatioByMethod
            .map(
              (m) =>
                `${m.method} (${m.readings} readings, lowest ${formatPercent(m.lowestAreaRatio)})`,
            )
            .join(', ')}; methods are not pooled; voided readings left out`
        : 'no readings in the range',
    },
    {
      label: 'Worst shortfall',
      value: s.worstSizesShort === null ? NONE : `${s.worstSizesShort} sizes`,
      detail: 'most standard sizes below its label a lot measured',
    },
    {
      label: 'Material mismatches',
      value: formatWhole(s.materialMismatches),
      detail: 'samples sold as copper found CCA or aluminium',
    },
    {
      label: 'Corrective actions',
      value: `${s.openCorrectiveActions} open`,
      detail: `${s.overdueCorrectiveActions} overdue today; mean response ${formatDays(s.meanResponseDays)}`,
    },
    {
      label: 'Chargebacks',
      value: s.chargebacks.length ? formatMoneyTotals(s.chargebacks).join(' · ') : NONE,
      detail:
        s.chargebacks.length > 1
          ? 'raised on returns in the range; one total per currency, never converted or added together'
          : 'raised on returns in the range',
    },
  ];
}

/** The headline figures, each with the words that say how it was counted. */
export function ScorecardSummary({ scorecard }: { scorecard: ScorecardRow }) {
  return (
    <Grid container spacing={2}>
      {tiles(scorecard).map((t) => (
        <Grid key={t.label} size={{ xs: 12, sm: 6, lg: 3 }}>
          <Paper variant="outlined" sx={{ p: 2, height: '100%' }}>
            <Typography variant="body2" color="text.secondary">
              {t.label}
            </Typography>
            <Typography variant="h5" component="p" sx={{ fontWeight: 600 }}>
              {t.value}
            </Typography>
            <Typography variant="caption" color="text.secondary">
              {t.detail}
            </Typography>
          </Paper>
        </Grid>
      ))}
    </Grid>
  );
}
