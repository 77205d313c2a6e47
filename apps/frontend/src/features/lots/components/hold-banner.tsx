import { Alert } from '@mui/material';
import type { LotStatus } from '@/features/lots/types';

const HELD: readonly LotStatus[] = ['on_hold', 'inspecting', 'awaiting_decision'];

/**
 * The lot stays on hold from receipt until a QA lead decides, whether or not inspection has
 * started: nothing is released by cutting samples.
 */
export function HoldBanner({ status, compact = false }: { status: LotStatus; compact?: boolean }) {
  if (!HELD.includes(status)) return null;
  const stage =
    status === 'on_hold'
      ? 'Cut the samples the plan asks for and record their readings.'
      : status === 'inspecting'
        ? 'Inspection is under way.'
        : 'The readings are in; the decision is next.';
  return (
    <Alert severity="warning" variant="filled" role="status" data-testid="hold-banner">
      <strong>On hold.</strong>{' '}
      {compact
        ? `Nothing from this lot may be used until a QA lead decides. ${stage}`
        : `Nothing from this lot may be used or shipped until a QA lead decides. ${stage}`}
    </Alert>
  );
}
