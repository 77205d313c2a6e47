import { Chip } from '@mui/material';
import { lotStatusColours, lotStatusLabels } from '@/features/lots/lib/lot-status';
import type { LotStatus } from '@/features/lots/types';

export function LotStatusChip({
  status,
  size = 'small',
}: {
  status: LotStatus;
  size?: 'small' | 'medium';
}) {
  return (
    <Chip
      size={size}
      color={lotStatusColours[status]}
      variant={status === 'accepted_on_concession' || status === 'returned' ? 'outlined' : 'filled'}
      label={lotStatusLabels[status]}
    />
  );
}
