import { LotsChecklist } from '@/components/lots-checklist';
import { useReturnableLots } from '@/features/returns/api/get-returnable-lots';
import { countOf } from '@/lib/counts';
import { formatDate } from '@/lib/dates';

interface ReturnableLotsPickerProps {
  supplierId: number | null;
  value: number[];
  onChange: (lotIds: number[]) => void;
  error?: string;
}

/** The supplier's rejected lots not yet on an open return, to tick. */
export function ReturnableLotsPicker({ supplierId, ...props }: ReturnableLotsPickerProps) {
  const lots = useReturnableLots(supplierId);
  return (
    <LotsChecklist
      supplierId={supplierId}
      query={lots}
      lots={lots.data}
      describe={(lot) =>
        `Lot ${lot.id} · PO ${lot.poNumber} · ${lot.product.sku} · ${countOf(lot.quantity, lot.unit)} · received ${formatDate(lot.receivedAt)}`
      }
      words={{
        title: 'Rejected lots',
        noSupplier: 'Choose the supplier to see its rejected lots.',
        loading: 'Loading rejected lots',
        loadFailed: 'The rejected lots could not be loaded',
        none: 'This supplier has no rejected lot that is not already on an open return.',
      }}
      {...props}
    />
  );
}
