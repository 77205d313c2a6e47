import { Chip, Tooltip } from '@mui/material';
import { severityLabels, type Product } from '@/features/products/types';

const colors = {
  normal: 'default',
  reduced: 'info',
  tightened: 'warning',
  discontinued: 'error',
} as const;

/** The product's current switching state (ISO 2859-1) with its reason on hover. */
export function InspectionStateChip({ state }: { state: Product['inspectionState'] }) {
  const chip = (
    <Chip size="small" color={colors[state.severity]} label={severityLabels[state.severity]} />
  );
  return state.reason ? <Tooltip title={state.reason}>{chip}</Tooltip> : chip;
}
