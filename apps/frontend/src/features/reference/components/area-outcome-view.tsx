import { Box, Stack, Typography } from '@mui/material';
import type { AreaOutcome } from '@/features/reference/calculations';
import { useUnits } from '@/lib/units';

/** ASTM B496 area acceptance, 98 % of nominal (REFERENCE §3), to colour the ratio only. */
const MIN_AREA_RATIO = 0.98;

const percent = (ratio: number) => `${(ratio * 100).toFixed(1)} %`;

/** The live result of an area calculator. */
export function AreaOutcomeView({ outcome }: { outcome: AreaOutcome }) {
  const { formatAreaMm2 } = useUnits();
  const { result, measuresAs, compare } = outcome;
  return (
    <Box aria-live="polite" data-testid="area-outcome">
      <Typography variant="h5" component="p">
        {formatAreaMm2(result.areaMm2)}{' '}
        <Typography component="span" color="text.secondary">
          ± {formatAreaMm2(result.UMm2)} (U, k = {result.coverageFactor})
        </Typography>
      </Typography>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <Typography>
          Measures as <strong>{measuresAs}</strong>
        </Typography>
        {compare && (
          <Typography color={compare.ratio >= MIN_AREA_RATIO ? 'success.main' : 'error.main'}>
            {percent(compare.ratio)} of {compare.gauge.label} (
            {formatAreaMm2(compare.gauge.nominalAreaMm2)})
          </Typography>
        )}
      </Stack>
      <Typography variant="body2" color="text.secondary">
        {result.note}
      </Typography>
    </Box>
  );
}
