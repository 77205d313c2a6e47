import { LotsChecklist } from '@/components/lots-checklist';
import { useSupplierLots } from '@/features/corrective-actions/api/get-supplier-lots';
import { inSentence, labelOf, lotStatusLabels } from '@/lib/labels';

interface SupplierLotsPickerProps {
  supplierId: number | null;
  value: number[];
  onChange: (lotIds: number[]) => void;
  error?: string;
}

/** The supplier's decided lots, to tick those a SCAR is about. */
export function SupplierLotsPicker({ supplierId, ...props }: SupplierLotsPickerProps) {
  const lots = useSupplierLots(supplierId);
  return (
    <LotsChecklist
      supplierId={supplierId}
      query={lots}
      lots={lots.data?.items}
      describe={(lot) =>
        `Lot ${lot.id} · PO ${lot.poNumber} · ${lot.product.sku} · ${inSentence(labelOf(lotStatusLabels, lot.status))}`
      }
      words={{
        title: 'Lots',
        listLabel: 'Lots of the supplier',
        noSupplier: 'Choose the supplier to see its lots.',
        loading: "Loading the supplier's lots",
        loadFailed: 'The lots could not be loaded',
        none: 'This supplier has no decided lot yet.',
      }}
      scroll
      {...props}
    />
  );
}
