import { Chip } from '@mui/material';
import { returnStatusLabels, type ReturnStatus } from '@/features/returns/types';

const colours = {
  draft: 'default',
  sent: 'info',
  acknowledged: 'warning',
  closed: 'success',
} as const;

export function ReturnStatusChip({ status }: { status: ReturnStatus }) {
  return <Chip size="small" color={colours[status]} label={returnStatusLabels[status]} />;
}
