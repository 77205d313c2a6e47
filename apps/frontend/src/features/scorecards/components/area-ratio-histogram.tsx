import { Typography } from '@mui/material';
import { ChartsReferenceLine } from '@mui/x-charts/ChartsReferenceLine';
import { LineChart } from '@mui/x-charts/LineChart';
import { ASTM_B496_MIN_RATIO, histogramSeries } from '@/features/scorecards/lib/chart-data';
import type { HistogramBin } from '@/features/scorecards/types';

/** Distribution of measured ÷ nominal area, as a step histogram with the 98 % line. */
export function AreaRatioHistogram({
  bins,
  skipAnimation,
}: {
  bins: HistogramBin[];
  skipAnimation?: boolean;
}) {
  const s = histogramSeries(bins);
  const minPercent = ASTM_B496_MIN_RATIO * 100;
  return (
    <>
      <LineChart
        height={260}
        skipAnimation={skipAnimation}
        xAxis={[
          {
            data: s.edgesPercent,
            scaleType: 'linear',
            min: s.edgesPercent[0],
            max: s.edgesPercent.at(-1),
            label: 'Measured area, % of the label’s nominal',
            valueFormatter: (v: number) => `${v} %`,
          },
        ]}
        yAxis={[{ min: 0, label: 'Readings', tickMinStep: 1 }]}
        series={[
          {
            data: s.steps,
            curve: 'stepAfter',
            area: true,
            showMark: false,
            label: 'Readings per 2.5 % bin',
          },
        ]}
        margin={{ left: 8, right: 28 }}
      >
        <ChartsReferenceLine
          x={minPercent}
          label="98 %"
          labelAlign="start"
          lineStyle={{ stroke: '#c62828', strokeDasharray: '6 3' }}
          labelStyle={{ fill: '#c62828', fontSize: 12 }}
        />
      </LineChart>
      <Typography variant="caption" color="text.secondary" component="p">
        {s.below ? `${s.below.count} reading(s) below ${s.below.edgePercent} %. ` : ''}
        {s.above ? `${s.above.count} reading(s) at ${s.above.edgePercent} % or more. ` : ''}
        The dashed line is the ASTM B496 minimum of 98 % of nominal area; a product’s own minimum
        may be set differently (see the products below).
      </Typography>
    </>
  );
}
