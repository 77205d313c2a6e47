import { Box, ButtonBase, Typography } from '@mui/material';
import { conductorLabel, verdictLabels } from '@/features/inspection/lib/labels';
import type { Conductor, Sample, SampleVerdict } from '@/features/inspection/types';

const colours: Record<SampleVerdict, string> = {
  conforms: 'success.light',
  nonconforming: 'error.light',
  inconclusive: 'warning.light',
  untested: 'grey.200',
};
const short: Record<SampleVerdict, string> = {
  conforms: 'OK',
  nonconforming: 'NC',
  inconclusive: '?',
  untested: '…',
};

interface LotOverviewGridProps {
  units: number;
  conductors: readonly Conductor[];
  samples: readonly Sample[];
  onJump: (sample: Sample) => void;
}

/**
 * Every unit × conductor of the plan with its verdict, compact enough for a phone: the QA
 * lead's and the dock's first look at a lot. A cell jumps to its sample.
 */
export function LotOverviewGrid({ units, conductors, samples, onJump }: LotOverviewGridProps) {
  const count = Math.max(units, ...samples.map((s) => s.seq));
  const ordered = [...conductors].sort((a, b) => a.position - b.position);
  return (
    <Box component="section" aria-label="Overview of the plan">
      <Box
        role="table"
        aria-label="Verdict per unit and conductor"
        sx={{
          display: 'grid',
          gridTemplateColumns: `3.5rem repeat(${ordered.length}, minmax(3rem, 8rem))`,
          gap: 0.5,
          alignItems: 'center',
          overflowX: 'auto',
        }}
      >
        <Box role="row" sx={{ display: 'contents' }}>
          <Typography role="columnheader" variant="caption" color="text.secondary">
            Unit
          </Typography>
          {ordered.map((c) => (
            <Typography
              role="columnheader"
              key={c.id}
              variant="caption"
              color="text.secondary"
              noWrap
              title={conductorLabel(c)}
            >
              {conductorLabel(c)}
            </Typography>
          ))}
        </Box>
        {Array.from({ length: count }, (_, i) => i + 1).map((seq) => (
          <Box role="row" key={seq} sx={{ display: 'contents' }}>
            <Typography role="rowheader" variant="body2" sx={{ fontWeight: 700 }}>
              {seq}
            </Typography>
            {ordered.map((c) => {
              const sample = samples.find((s) => s.seq === seq && s.conductorId === c.id);
              const words = sample
                ? `Unit ${seq} ${conductorLabel(c)}: ${verdictLabels[sample.verdict]}`
                : `Unit ${seq} ${conductorLabel(c)}: not cut yet`;
              return (
                <ButtonBase
                  role="cell"
                  key={c.id}
                  aria-label={words}
                  title={words}
                  disabled={!sample}
                  onClick={() => sample && onJump(sample)}
                  sx={{
                    height: 32,
                    borderRadius: 1,
                    border: 1,
                    borderStyle: sample ? 'solid' : 'dashed',
                    borderColor: 'divider',
                    bgcolor: sample ? colours[sample.verdict] : 'transparent',
                    fontWeight: 700,
                    fontSize: 13,
                  }}
                >
                  {sample ? short[sample.verdict] : '—'}
                </ButtonBase>
              );
            })}
          </Box>
        ))}
      </Box>
      <Typography variant="caption" color="text.secondary">
        OK conforms · NC nonconforming · ? inconclusive · … cut, no reading yet · — not cut
      </Typography>
    </Box>
  );
}
