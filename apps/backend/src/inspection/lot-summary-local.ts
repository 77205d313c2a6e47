import type { Lot } from '../lots/entities/lot.entity';
import type { Product } from '../products/entities/product.entity';
import type { Supplier } from '../suppliers/entities/supplier.entity';

/**
 * Interim LotSummary and Product mappers (docs/api-conventions.md) until the catalog's
 * src/lots/lot-summary.ts lands; then this file goes.
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

export function productView(p: Product, s: Supplier) {
  return {
    id: p.id,
    supplier: { id: s.id, name: s.name, code: s.code, status: s.status },
    sku: p.sku,
    kind: p.kind,
    description: p.description,
    lengthPerUnitM: p.lengthPerUnitM,
    inspectionLevel: p.inspectionLevel,
    aql: p.aql,
    minAreaRatio: p.minAreaRatio,
    active: p.active,
    conductors: [...p.conductors.getItems()]
      .sort((a, b) => a.position - b.position)
      .map((c) => ({
        id: c.id,
        position: c.position,
        purpose: c.purpose,
        gauge: c.gaugeLabel,
        gaugeSystem: c.gaugeSystem,
        nominalAreaMm2: c.nominalAreaMm2,
        claimedMaterial: c.claimedMaterial,
        claimedStrands: c.claimedStrands,
        active: c.active,
      })),
  };
}

export function supplierWarning(s: Supplier): string | null {
  if (s.status === 'suspended') {
    return `${s.name} is suspended: inspect this delivery with care and do not accept it without a QA lead's review.`;
  }
  if (s.status === 'probation') return `${s.name} is on probation: watch this delivery closely.`;
  return null;
}
