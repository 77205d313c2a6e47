import { LineChart } from '@mui/x-charts/LineChart';
import { acceptanceSeries } from '@/features/scorecards/lib/chart-data';
import { formatMonth } from '@/lib/dates';
import type { TrendPoint } from '@/features/scorecards/types';

interface Props {
  trend: TrendPoint[];
  skipAnimation?: boolean;
}

/**
 * Acceptance rate by month as points on a line, so a 0 % month is a visible point on the
 * floor rather than a missing bar; a month without decided lots is a gap.
 */
export function AcceptanceTrendChart({ trend, skipAnimation }: Props) {
  const s = acceptanceSeries(trend);
  return (
    <LineChart
      height={260}
      skipAnimation={skipAnimation}
      xAxis={[{ scaleType: 'point', data: s.months, valueFormatter: formatMonth }]}
      yAxis={[{ min: 0, max: 100, label: '% of decided lots' }]}
      series={[
        {
          data: s.ratePercent,
          label: 'Accepted on inspection',
          showMark: true,
          valueFormatter: (v, { dataIndex }) =>
            v === null ? 'no lot decided' : `${v} % (${s.lots[dataIndex]} lots received)`,
        },
      ]}
      margin={{ left: 8, right: 28 }}
    />
  );
}
