import { MenuItem, TextField } from '@mui/material';
import { useSupplierOptions } from '@/features/corrective-actions/api/get-supplier-options';

interface SupplierSelectProps {
  value: number | null;
  onChange: (supplierId: number | null) => void;
  /** Offer "All suppliers" (a filter) rather than requiring a choice (a form). */
  allowAll?: boolean;
  error?: string;
  required?: boolean;
}

export function SupplierSelect({
  value,
  onChange,
  allowAll,
  error,
  required,
}: SupplierSelectProps) {
  const suppliers = useSupplierOptions();
  const items = suppliers.data?.items ?? [];
  return (
    <TextField
      select
      fullWidth={!allowAll}
      label="Supplier"
      required={required}
      value={value !== null && items.some((s) => s.id === value) ? String(value) : ''}
      onChange={(event) => onChange(event.target.value ? Number(event.target.value) : null)}
      error={!!error || suppliers.isError}
      helperText={error ?? (suppliers.isError ? 'The supplier list cannot be loaded.' : undefined)}
      sx={{ minWidth: 240, mt: 0 }}
    >
      {allowAll && <MenuItem value="">All suppliers</MenuItem>}
      {items.map((s) => (
        <MenuItem key={s.id} value={String(s.id)}>
          {s.name} ({s.code})
        </MenuItem>
      ))}
    </TextField>
  );
}
