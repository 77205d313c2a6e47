import {
  MATERIALS,
  TYPICAL_MAX_DROP_FRACTION,
  TYPICAL_MAX_DROP_V,
  ohmPerKmToOhmPerKft,
} from '@gaugeproof/standards';
import { Paper, Stack, Typography } from '@mui/material';
import {
  NOMINAL_SYSTEM_V,
  type DropOutcome,
  type DropSide,
} from '@/features/reference/calculations';
import { useUnits } from '@/lib/units';

function Side({ title, side, testId }: { title: string; side: DropSide; testId: string }) {
  const { system, formatAreaMm2, formatResistanceOhm } = useUnits();
  const over = side.volts > TYPICAL_MAX_DROP_V || side.fraction > TYPICAL_MAX_DROP_FRACTION;
  const perKm = side.resistancePerMetreOhm * 1000;
  const perLength =
    system === 'imperial'
      ? `${ohmPerKmToOhmPerKft(perKm).toFixed(4)} Ω per 1000 ft`
      : `${perKm.toFixed(4)} Ω/km`;
  return (
    <Paper variant="outlined" sx={{ p: 2, flex: 1 }} data-testid={testId}>
      <Typography variant="subtitle1" sx={{ fontWeight: 600 }}>
        {title}
      </Typography>
      <Typography variant="body2" color="text.secondary">
        {formatAreaMm2(side.areaMm2)} of {MATERIALS[side.material].name}
      </Typography>
      <Typography
        variant="h4"
        component="p"
        color={over ? 'error.main' : 'text.primary'}
        sx={{ my: 1 }}
      >
        {side.volts.toFixed(2)} V{' '}
        <Typography component="span" variant="h6" color="inherit">
          ({(side.fraction * 100).toFixed(1)} % of {NOMINAL_SYSTEM_V} V)
        </Typography>
      </Typography>
      <Typography variant="body2">Conductor: {perLength}</Typography>
      <Typography variant="body2">
        Whole circuit: {formatResistanceOhm(side.resistanceOhm)}
      </Typography>
      {over && (
        <Typography variant="body2" color="error.main">
          Above the usual {TYPICAL_MAX_DROP_V} V or {TYPICAL_MAX_DROP_FRACTION * 100} % (common
          practice).
        </Typography>
      )}
    </Paper>
  );
}

/** Labelled against measured, side by side. */
export function DropResults({ outcome }: { outcome: DropOutcome }) {
  const { formatLengthMm } = useUnits();
  return (
    <Stack spacing={1} aria-live="polite">
      <Typography variant="body2" color="text.secondary">
        Circuit length {formatLengthMm(outcome.circuitLengthM * 1000)} (power plus ground).
        Percentages are of {NOMINAL_SYSTEM_V} V, a charged 12 V lead-acid battery at rest (common
        practice, no source).
      </Typography>
      <Stack direction={{ xs: 'column', md: 'row' }} spacing={2}>
        <Side
          title={`As labelled: ${outcome.gauge.label} copper`}
          side={outcome.labelled}
          testId="drop-labelled"
        />
        {outcome.measured ? (
          <Side title="As measured" side={outcome.measured} testId="drop-measured" />
        ) : (
          <Paper variant="outlined" sx={{ p: 2, flex: 1, color: 'text.secondary' }}>
            Enter a measured area to compare the real conductor with its label.
          </Paper>
        )}
      </Stack>
    </Stack>
  );
}
