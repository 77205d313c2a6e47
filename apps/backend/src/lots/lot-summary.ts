import type { Supplier } from '../suppliers/entities/supplier.entity';
import { supplierRef } from '../suppliers/supplier-view';
import type { Lot } from './entities/lot.entity';

/**
 * LotSummary of docs/api-conventions.md. `product`, `supplier` and `receivedBy` must be
 * loaded. The lot detail builds on it.
 */
export function lotSummary(lot: Lot) {
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
    supplier: supplierRef(lot.supplier),
    samplingPlan: lot.samplingPlan,
    version: lot.version,
  };
}
export type LotSummary = ReturnType<typeof lotSummary>;

/**
 * What the clerk must see first on a delivery from a supplier not in good standing. A
 * suspended supplier's delivery is still received (the cable is on the dock) but held.
 */
export function supplierWarning(s: Supplier): string | null {
  if (s.status === 'suspended') {
    return `${s.name} (${s.code}) is suspended: this delivery is received and held, but it must not be accepted or used without the QA lead's review.`;
  }
  if (s.status === 'probation') {
    return `${s.name} (${s.code}) is on probation: inspect this delivery with particular care.`;
  }
  return null;
}
