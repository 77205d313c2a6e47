import {
  Alert,
  Checkbox,
  FormControlLabel,
  FormGroup,
  FormHelperText,
  Skeleton,
  Typography,
} from '@mui/material';
import { useSupplierLots } from '@/features/corrective-actions/api/get-supplier-lots';
import { inSentence, labelOf, lotStatusLabels } from '@/lib/labels';
import { errorMessage } from '@/lib/query-client';

interface SupplierLotsPickerProps {
  supplierId: number | null;
  value: number[];
  onChange: (lotIds: number[]) => void;
  error?: string;
}

export function SupplierLotsPicker({
  supplierId,
  value,
  onChange,
  error,
}: SupplierLotsPickerProps) {
  const lots = useSupplierLots(supplierId);
  if (supplierId === null)
    return <Typography color="text.secondary">Choose the supplier to see its lots.</Typography>;
  if (lots.isPending)
    return <Skeleton variant="rounded" height={64} aria-label="Loading the supplier's lots" />;
  if (lots.isError)
    return <Alert severity="error">The lots could not be loaded: {errorMessage(lots.error)}</Alert>;
  if (lots.data.items.length === 0) {
    return <Typography color="text.secondary">This supplier has no decided lot yet.</Typography>;
  }
  const toggle = (id: number, on: boolean) =>
    onChange(on ? [...value, id] : value.filter((v) => v !== id));
  return (
    <div>
      <Typography variant="subtitle2">Lots</Typography>
      <FormGroup
        aria-label="Lots of the supplier"
        sx={{ maxHeight: 220, overflowY: 'auto', flexWrap: 'nowrap' }}
      >
        {lots.data.items.map((lot) => (
          <FormControlLabel
            key={lot.id}
            control={
              <Checkbox
                checked={value.includes(lot.id)}
                onChange={(e) => toggle(lot.id, e.target.checked)}
              />
            }
            label={`Lot ${lot.id} · PO ${lot.poNumber} · ${lot.product.sku} · ${inSentence(labelOf(lotStatusLabels, lot.status))}`}
          />
        ))}
      </FormGroup>
      {error && <FormHelperText error>{error}</FormHelperText>}
    </div>
  );
}
