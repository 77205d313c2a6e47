import { Chip } from '@mui/material';
import { returnStatusLabels, type ReturnStatus } from '@/features/returns/types';

const colours = {
  draft: 'default',
  emailed: 'info',
  shipped: 'info',
  acknowledged: 'warning',
  credited: 'warning',
  closed: 'success',
  cancelled: 'default',
} as const;

export function ReturnStatusChip({ status }: { status: ReturnStatus }) {
  return (
    <Chip
      size="small"
      color={colours[status]}
      variant={status === 'cancelled' ? 'outlined' : 'filled'}
      label={returnStatusLabels[status]}
    />
  );
}
