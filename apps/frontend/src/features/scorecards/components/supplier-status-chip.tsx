import { Chip } from '@mui/material';
import type { ScorecardRow } from '@/features/scorecards/types';

const colors = { approved: 'success', probation: 'warning', suspended: 'error' } as const;

export function SupplierStatusChip({ status }: { status: ScorecardRow['status'] }) {
  return <Chip size="small" variant="outlined" color={colors[status]} label={status} />;
}
