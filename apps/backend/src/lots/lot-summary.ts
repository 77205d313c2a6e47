import { instantOf, jsonOf } from '../common/sql-values';
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

/** The columns of a lot list row (aliases l, p, s, u), read without building entities. */
export const LIST_COLUMNS = [
  'l.id, l.status, l.po_number, l.packing_slip, l.supplier_lot_code, l.quantity, l.unit',
  'l.received_at, l.sampling_plan, l.version, u.id as u_id, u.name as u_name',
  'p.id as p_id, p.sku as p_sku, p.description as p_description, p.kind as p_kind',
  's.id as s_id, s.name as s_name, s.code as s_code, s.status as s_status',
];

/** SQLite keeps datetimes as epoch milliseconds and JSON as text; PostgreSQL as values. */

/** LotSummary from a row of LIST_COLUMNS: the same shape as lotSummary(lot). */
export function summaryOfRow(r: Record<string, unknown>): LotSummary {
  return {
    id: Number(r.id),
    status: r.status as Lot['status'],
    poNumber: String(r.po_number),
    packingSlip: (r.packing_slip as string | null) ?? null,
    supplierLotCode: (r.supplier_lot_code as string | null) ?? null,
    quantity: Number(r.quantity),
    unit: String(r.unit),
    receivedAt: instantOf(r.received_at),
    receivedBy: { id: Number(r.u_id), name: String(r.u_name) },
    product: {
      id: Number(r.p_id),
      sku: String(r.p_sku),
      description: String(r.p_description),
      kind: r.p_kind as Lot['product']['kind'],
    },
    supplier: {
      id: Number(r.s_id),
      name: String(r.s_name),
      code: String(r.s_code),
      status: r.s_status as Supplier['status'],
    },
    samplingPlan: jsonOf<Lot['samplingPlan']>(r.sampling_plan),
    version: Number(r.version),
  };
}

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
