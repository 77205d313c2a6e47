import { Chip, Stack } from '@mui/material';
import { carStatusLabels, type CorrectiveAction } from '@/features/corrective-actions/types';

const colours = {
  open: 'info',
  responded: 'warning',
  verified: 'success',
  reopened: 'warning',
  closed: 'default',
} as const;

/** Status, with "Overdue" beside it once the response is late. */
export function CarStatusChip({
  car,
}: {
  car: Pick<CorrectiveAction, 'status' | 'overdue' | 'daysOverdue'>;
}) {
  return (
    <Stack direction="row" spacing={0.5}>
      <Chip size="small" color={colours[car.status]} label={carStatusLabels[car.status]} />
      {car.overdue && <Chip size="small" color="error" label={`Overdue ${car.daysOverdue} d`} />}
    </Stack>
  );
}
