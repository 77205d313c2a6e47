import { Chip } from '@mui/material';
import { supplierStatusLabels, type SupplierStatus } from '@/features/suppliers/types';

const colors = { approved: 'success', probation: 'warning', suspended: 'error' } as const;

export function SupplierStatusChip({ status }: { status: SupplierStatus }) {
  return (
    <Chip
      size="small"
      color={colors[status]}
      variant={status === 'approved' ? 'outlined' : 'filled'}
      label={supplierStatusLabels[status]}
    />
  );
}
