import { Box, ButtonBase, Typography } from '@mui/material';
import { verdictLabels } from '@/features/inspection/lib/labels';
import type { Sample, SampleVerdict } from '@/features/inspection/types';

const colours: Record<SampleVerdict, string> = {
  conforms: 'success.light',
  nonconforming: 'error.light',
  inconclusive: 'warning.light',
  untested: 'grey.200',
};

interface UnitGridProps {
  /** Units the plan asks for, 1..n. */
  units: number;
  samples: readonly Sample[];
  selectedSampleId: number | null;
  onSelect: (sample: Sample) => void;
}

/** One square per planned unit: its sample's verdict, or empty while not cut. */
export function UnitGrid({ units, samples, selectedSampleId, onSelect }: UnitGridProps) {
  const count = Math.max(units, ...samples.map((s) => s.seq));
  return (
    <Box
      role="list"
      aria-label="Units of the plan"
      sx={{ display: 'flex', flexWrap: 'wrap', gap: 0.75 }}
    >
      {Array.from({ length: count }, (_, i) => i + 1).map((seq) => {
        const sample = samples.find((s) => s.seq === seq);
        const verdict = sample?.verdict;
        const title = sample
          ? `Unit ${seq}: ${verdictLabels[sample.verdict]}`
          : `Unit ${seq}: not cut yet`;
        return (
          <ButtonBase
            role="listitem"
            key={seq}
            title={title}
            aria-label={title}
            disabled={!sample}
            onClick={() => sample && onSelect(sample)}
            sx={{
              width: 44,
              height: 44,
              borderRadius: 1,
              border: 2,
              borderStyle: sample ? 'solid' : 'dashed',
              borderColor: sample && sample.id === selectedSampleId ? 'primary.main' : 'divider',
              bgcolor: verdict ? colours[verdict] : 'transparent',
              flexDirection: 'column',
            }}
          >
            <Typography variant="body2" sx={{ fontWeight: 700, lineHeight: 1 }}>
              {seq}
            </Typography>
            <Typography variant="caption" sx={{ lineHeight: 1, fontSize: 10 }}>
              {verdict === 'nonconforming'
                ? 'NC'
                : verdict === 'conforms'
                  ? 'OK'
                  : verdict === 'inconclusive'
                    ? '?'
                    : sample
                      ? '…'
                      : ''}
            </Typography>
          </ButtonBase>
        );
      })}
    </Box>
  );
}
