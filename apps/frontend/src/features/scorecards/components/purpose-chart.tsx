import { BarChart } from '@mui/x-charts/BarChart';
import { purposeSeries } from '@/features/scorecards/lib/chart-data';
import { conductorPurposeLabels, labelOf } from '@/lib/labels';
import type { PurposeCount } from '@/features/scorecards/types';

/** Tested samples per conductor purpose, nonconforming stacked on conforming. */
export function PurposeChart({
  rows,
  skipAnimation,
}: {
  rows: PurposeCount[];
  skipAnimation?: boolean;
}) {
  const s = purposeSeries(rows);
  return (
    <BarChart
      height={260}
      skipAnimation={skipAnimation}
      layout="horizontal"
      yAxis={[
        {
          scaleType: 'band',
          data: s.purposes,
          valueFormatter: (p: string) => labelOf(conductorPurposeLabels, p),
          width: 110,
        },
      ]}
      xAxis={[{ min: 0, label: 'Samples tested', tickMinStep: 1 }]}
      series={[
        { data: s.nonconforming, label: 'Nonconforming', stack: 'samples', color: '#c62828' },
        {
          data: s.conforming,
          label: 'Conforming or inconclusive',
          stack: 'samples',
          color: '#90a4ae',
        },
      ]}
      margin={{ left: 8, right: 16 }}
    />
  );
}
