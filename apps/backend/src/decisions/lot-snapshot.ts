import type { Lot } from '../lots/entities/lot.entity';

/**
 * The lot as LotSummary (docs/api-conventions.md) for a 409's `current` and a decision's
 * answer. Needs product, supplier and receivedBy loaded.
 */
export function lotSnapshot(lot: Lot) {
  return {
    id: lot.id,
    status: lot.status,
    poNumber: lot.poNumber,
    packingSlip: lot.packingSlip,
    supplierLotCode: lot.supplierLotCode,
    quantity: lot.quantity,
    unit: lot.unit,
    receivedAt: lot.receivedAt,
    receivedBy: { id: lot.receivedBy.id, name: lot.receivedBy.name },
    product: {
      id: lot.product.id,
      sku: lot.product.sku,
      description: lot.product.description,
      kind: lot.product.kind,
    },
    supplier: {
      id: lot.supplier.id,
      name: lot.supplier.name,
      code: lot.supplier.code,
      status: lot.supplier.status,
    },
    samplingPlan: lot.samplingPlan,
    version: lot.version,
  };
}
