import { Box, Typography } from '@mui/material';
import { crossSectionGeometry } from '@/features/inspection/lib/cross-section';
import { useUnits } from '@/lib/units';

interface CrossSectionDrawingProps {
  gauge: string;
  nominalAreaMm2: number;
  measuredAreaMm2: number;
  measuresAs: string;
  /** Shown grey instead of copper when the metal found is not copper. */
  notCopper?: boolean;
}

const MAX_R = 70;
const PAD = 14;
const COPPER = '#b87333';

/** The labelled and the measured copper cross-sections side by side, to one scale. */
export function CrossSectionDrawing(props: CrossSectionDrawingProps) {
  const { formatAreaMm2, formatLengthMm } = useUnits();
  const g = crossSectionGeometry(props.nominalAreaMm2, props.measuredAreaMm2, MAX_R);
  const cell = 2 * MAX_R + 2 * PAD;
  const cy = PAD + MAX_R;
  const width = 2 * cell;
  const height = cell + 70;
  const labelledArea = formatAreaMm2(g.labelled.areaMm2);
  const measuredArea = formatAreaMm2(g.measured.areaMm2);
  const labelled = `${props.gauge} label ${labelledArea}`;
  const measured = `measured ${measuredArea} (≈ ${props.measuresAs})`;
  const title = `Cross-sections to scale: ${labelled}; ${measured}.`;

  return (
    <Box>
      <svg
        role="img"
        aria-label={title}
        viewBox={`0 0 ${width} ${height}`}
        width="100%"
        style={{ maxWidth: 420 }}
      >
        <title>{title}</title>
        <circle
          cx={cell / 2}
          cy={cy}
          r={g.labelled.radiusPx}
          fill={COPPER}
          fillOpacity={0.35}
          stroke={COPPER}
          strokeDasharray="4 3"
          strokeWidth={1.5}
        />
        <circle
          cx={cell + cell / 2}
          cy={cy}
          r={g.measured.radiusPx}
          fill={props.notCopper ? '#9e9e9e' : COPPER}
          stroke="#5d4037"
          strokeWidth={1}
        />
        <text x={cell / 2} y={cell + 6} textAnchor="middle" fontSize={12}>
          <tspan x={cell / 2}>{props.gauge} label</tspan>
          <tspan x={cell / 2} dy={15}>
            {labelledArea}
          </tspan>
        </text>
        <text x={cell + cell / 2} y={cell + 6} textAnchor="middle" fontSize={12} fontWeight={700}>
          <tspan x={cell + cell / 2}>measured {measuredArea}</tspan>
          <tspan x={cell + cell / 2} dy={15}>
            ≈ {props.measuresAs}
          </tspan>
        </text>
        <line
          x1={PAD}
          x2={PAD + g.scaleBarPx}
          y1={height - 14}
          y2={height - 14}
          stroke="#333"
          strokeWidth={2}
        />
        <text x={PAD + g.scaleBarPx + 6} y={height - 10} fontSize={11}>
          {formatLengthMm(g.scaleBarMm)}
        </text>
      </svg>
      <Typography variant="caption" color="text.secondary" component="p">
        Circle areas are in proportion to the copper areas (a solid circle of the same area; real
        strands leave gaps).
      </Typography>
    </Box>
  );
}
