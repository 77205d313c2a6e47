import type { EntityManager } from '@mikro-orm/core';
import { DomainError } from '../common/domain-error';
import { Lot } from './entities/lot.entity';
import { lotSummary, type LotSummary } from './lot-summary';

/**
 * The lots already received under this PO number and packing slip (issue 15: receiving
 * warns on a PO and packing slip already received). Letter case and outer spaces are
 * ignored, since clerks type and scanners read the same code both ways; the PO is looked up
 * through its index in the spellings a clerk types (as given, upper, lower), the slip compared
 * in full. No packing slip, no match: a second delivery on one PO with another slip (or none)
 * is an ordinary delivery.
 */
export async function lotsReceivedAs(
  em: EntityManager,
  poNumber: string,
  packingSlip: string | null | undefined,
): Promise<LotSummary[]> {
  const po = poNumber.trim();
  const slip = packingSlip?.trim().toLowerCase() ?? '';
  if (!po || !slip) return [];
  const spellings = [...new Set([po, po.toUpperCase(), po.toLowerCase()])];
  const lots = await em.find(
    Lot,
    { poNumber: { $in: spellings }, packingSlip: { $ne: null } },
    { populate: ['product', 'supplier', 'receivedBy'], orderBy: { receivedAt: 'asc', id: 'asc' } },
  );
  return lots
    .filter(
      (l) =>
        l.poNumber.toLowerCase() === po.toLowerCase() &&
        l.packingSlip?.trim().toLowerCase() === slip,
    )
    .map(lotSummary);
}

const day = (at: Date | string) => new Date(at).toISOString().slice(0, 10);

/** "lot 12 (received 2026-11-30, 40 spools of HLC HL-4)", for the sentence below. */
function lotWords(l: LotSummary): string {
  return `lot ${l.id} (received ${day(l.receivedAt)}, ${l.quantity} ${l.unit} of ${l.supplier.code} ${l.product.sku})`;
}

/** The sentence the clerk reads, naming every lot already received under the slip. */
export function alreadyReceivedMessage(
  poNumber: string,
  packingSlip: string,
  lots: readonly LotSummary[],
): string {
  return (
    `PO ${poNumber.trim()} with packing slip ${packingSlip.trim()} was already received as ` +
    `${lots.map(lotWords).join(' and ')}. If this is another delivery under the same slip, ` +
    'confirm to receive it again; otherwise open the lot already received.'
  );
}

/**
 * 409 on the packing slip, with the lots already received (`alreadyReceived`) so the form
 * can link them; the clerk confirms with `receiveAgain: true` (a confirmable warning, not a
 * refusal: a supplier may ship a back order under the first slip).
 */
export function alreadyReceivedError(
  poNumber: string,
  packingSlip: string,
  lots: readonly LotSummary[],
): DomainError {
  return new DomainError(
    'conflict',
    [{ field: 'packingSlip', message: alreadyReceivedMessage(poNumber, packingSlip, lots) }],
    {
      alreadyReceived: lots.map((l) => ({
        id: l.id,
        status: l.status,
        receivedAt: l.receivedAt,
        quantity: l.quantity,
        unit: l.unit,
      })),
    },
  );
}
