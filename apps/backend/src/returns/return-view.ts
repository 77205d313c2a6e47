import type { VendorReturn } from './entities/vendor-return.entity';

/**
 * What purchasing writes on a return and what it charges back: the same fields in the
 * API's view and in the audit trail's before and after.
 */
export const returnTerms = (r: VendorReturn) => ({
  rmaNumber: r.rmaNumber,
  notes: r.notes,
  supplierNote: r.supplierNote,
  shareDecisionReason: r.shareDecisionReason,
  costs: r.costs,
  chargebackTotal: r.chargebackTotal,
  currency: r.currency,
});

/** VendorReturn as the API shows it; lots, supplier and createdBy loaded. */
export function returnView(r: VendorReturn) {
  return {
    id: r.id,
    number: r.number,
    status: r.status,
    version: r.version,
    supplier: {
      id: r.supplier.id,
      name: r.supplier.name,
      code: r.supplier.code,
      status: r.supplier.status,
      contactEmail: r.supplier.contactEmail,
    },
    lots: r.lots
      .getItems()
      .sort((a, b) => a.id - b.id)
      .map((l) => ({
        id: l.id,
        poNumber: l.poNumber,
        status: l.status,
        quantity: l.quantity,
        unit: l.unit,
      })),
    ...returnTerms(r),
    emailedAt: r.emailedAt,
    shipment: r.shippedOn
      ? {
          carrier: r.carrier,
          trackingNumber: r.trackingNumber,
          shippedOn: r.shippedOn,
          quantity: r.shippedQuantity,
        }
      : null,
    acknowledgedAt: r.acknowledgedAt,
    credit:
      r.creditNoteNumber !== null
        ? { creditNoteNumber: r.creditNoteNumber, amount: r.creditAmount, creditedAt: r.creditedAt }
        : null,
    closedAt: r.closedAt,
    cancelReason: r.cancelReason,
    cancelledAt: r.cancelledAt,
    createdBy: { id: r.createdBy.id, name: r.createdBy.name },
    createdAt: r.createdAt,
    updatedAt: r.updatedAt,
  };
}
export type ReturnView = ReturnType<typeof returnView>;
