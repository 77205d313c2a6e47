import {
  Alert,
  Checkbox,
  FormControlLabel,
  FormGroup,
  FormHelperText,
  Skeleton,
  Typography,
} from '@mui/material';
import { useReturnableLots } from '@/features/returns/api/get-returnable-lots';
import { errorMessage } from '@/lib/query-client';
import { formatDate } from '@/lib/dates';
import { countOf } from '@/lib/counts';

interface ReturnableLotsPickerProps {
  supplierId: number | null;
  value: number[];
  onChange: (lotIds: number[]) => void;
  error?: string;
}

/** The supplier's rejected lots not yet on an open return, to tick. */
export function ReturnableLotsPicker({
  supplierId,
  value,
  onChange,
  error,
}: ReturnableLotsPickerProps) {
  const lots = useReturnableLots(supplierId);
  if (supplierId === null) {
    return (
      <Typography color="text.secondary">Choose the supplier to see its rejected lots.</Typography>
    );
  }
  if (lots.isPending)
    return <Skeleton variant="rounded" height={64} aria-label="Loading rejected lots" />;
  if (lots.isError)
    return (
      <Alert severity="error">
        The rejected lots could not be loaded: {errorMessage(lots.error)}
      </Alert>
    );
  if (lots.data.length === 0) {
    return (
      <Typography color="text.secondary">
        This supplier has no rejected lot that is not already on an open return.
      </Typography>
    );
  }
  const toggle = (id: number, on: boolean) =>
    onChange(on ? [...value, id] : value.filter((v) => v !== id));
  return (
    <div>
      <Typography variant="subtitle2">Rejected lots</Typography>
      <FormGroup aria-label="Rejected lots">
        {lots.data.map((lot) => (
          <FormControlLabel
            key={lot.id}
            control={
              <Checkbox
                checked={value.includes(lot.id)}
                onChange={(e) => toggle(lot.id, e.target.checked)}
              />
            }
            label={`Lot ${lot.id} · PO ${lot.poNumber} · ${lot.product.sku} · ${countOf(lot.quantity, lot.unit)} · received ${formatDate(lot.receivedAt)}`}
          />
        ))}
      </FormGroup>
      {error && <FormHelperText error>{error}</FormHelperText>}
    </div>
  );
}
