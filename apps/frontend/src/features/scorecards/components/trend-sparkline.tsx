import { Typography } from '@mui/material';
import { SparkLineChart } from '@mui/x-charts/SparkLineChart';
import { sparklinePoints } from '@/features/scorecards/lib/chart-data';
import { formatMonth } from '@/lib/dates';
import type { TrendPoint } from '@/features/scorecards/types';

/** Acceptance rate by month, months with decided lots only; a dash with fewer than two. */
export default function TrendSparkline({ trend, name }: { trend: TrendPoint[]; name: string }) {
  const points = sparklinePoints(trend);
  if (points.ratePercent.length < 2) {
    return (
      <Typography variant="body2" color="text.secondary" aria-label={`No trend for ${name}`}>
        —
      </Typography>
    );
  }
  return (
    <SparkLineChart
      data={points.ratePercent}
      xAxis={{ scaleType: 'point', data: points.months, valueFormatter: formatMonth }}
      yAxis={{ min: 0, max: 100 }}
      valueFormatter={(v) => (v === null ? '' : `${v} % accepted`)}
      height={32}
      width={88}
      showTooltip
      showHighlight
      aria-label={`Acceptance trend of ${name}`}
    />
  );
}
