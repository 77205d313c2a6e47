import { Alert, Stack } from '@mui/material';
import { SafetyCaution } from '@/components/safety-caution';

interface ConductorCautionProps {
  label: string;
  undersized: boolean;
  notCopper: boolean;
}

/** Shown whenever a conductor is undersized or not copper: the consequence for the installer. */
export function ConductorCaution({ label, undersized, notCopper }: ConductorCautionProps) {
  if (!undersized && !notCopper) return null;
  const what = [
    undersized ? 'carries less copper than its label promises' : null,
    notCopper ? 'is not copper' : null,
  ]
    .filter(Boolean)
    .join(' and ');
  return (
    <Stack spacing={1} role="alert" aria-label={`Caution for ${label}`}>
      <Alert severity="error">
        The {label} conductor {what}. An undersized or aluminium conductor has more resistance: it
        drops more voltage and runs hotter, and a fuse sized for the label may not protect it.
      </Alert>
      <SafetyCaution />
    </Stack>
  );
}
