import { Alert, Box, Typography } from '@mui/material';
import { VerdictChip } from '@/features/inspection/components/verdict-chip';
import type { ReadingPreview } from '@/features/inspection/lib/reading-preview';
import { formatPercent, formatWithUncertainty } from '@gaugeproof/standards';
import { useUnits } from '@/lib/units';

/** The live result while typing; the server's stored result replaces it once recorded. */
export function ReadingPreviewPanel({ preview }: { preview: ReadingPreview | null }) {
  const { formatAreaMm2 } = useUnits();
  if (preview === null) {
    return (
      <Typography color="text.secondary">Type the readings to see the result as you go.</Typography>
    );
  }
  if (!preview.ok) return <Alert severity="warning">{preview.message}</Alert>;
  const { area, assessment } = preview;
  return (
    <Box
      aria-label="Live result"
      role="status"
      sx={{ p: 1.5, border: 1, borderColor: 'divider', borderRadius: 1 }}
    >
      <Typography variant="overline">Preview — the server recomputes</Typography>
      <Typography variant="h5" component="p">
        Measures as {assessment.measuresAs.label} <VerdictChip verdict={assessment.verdict} />
      </Typography>
      <Typography>
        {formatWithUncertainty(area.areaMm2, area.UMm2, 'mm²')} (k = {area.coverageFactor}):{' '}
        {formatPercent(assessment.areaRatio)} of the {assessment.gauge.label} nominal{' '}
        {formatAreaMm2(assessment.gauge.nominalAreaMm2)}
      </Typography>
      {assessment.reasons.slice(1).map((reason) => (
        <Typography key={reason} variant="body2" color="text.secondary">
          {reason}
        </Typography>
      ))}
    </Box>
  );
}
