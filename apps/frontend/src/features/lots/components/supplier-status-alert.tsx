import { Alert } from '@mui/material';
import type { SupplierRef } from '@/features/lots/types';

/** A suspended supplier's delivery can still be received, but nobody should miss the fact. */
export function SupplierStatusAlert({ supplier }: { supplier: SupplierRef }) {
  if (supplier.status === 'suspended') {
    return (
      <Alert severity="error">
        {supplier.name} is suspended. You can still receive and hold this delivery, but tell the QA
        lead and purchasing before anything from it is used.
      </Alert>
    );
  }
  if (supplier.status === 'probation') {
    return (
      <Alert severity="warning">
        {supplier.name} is on probation: inspect this delivery with care.
      </Alert>
    );
  }
  return null;
}
