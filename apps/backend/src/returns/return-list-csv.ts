import type { CsvRow } from '../common/csv';
import { utcMinute } from '../common/reading-words';
import type { ReturnView } from './return-view';

/** Headers in words, like the readings export; the chargeback with its ISO 4217 currency. */
export const RETURN_LIST_HEADER = [
  'RTV',
  'Status',
  'Supplier code',
  'Supplier',
  'Lots',
  'POs',
  'RMA',
  'Chargeback',
  'Currency',
  'Raised by',
  'Raised (UTC)',
] as const;

/** The returns list as CSV rows, block by block. */
export async function* returnListRows(
  blocks: AsyncIterable<ReturnView[]>,
): AsyncGenerator<CsvRow[]> {
  for await (const block of blocks) {
    yield block.map((r) => [
      r.number,
      r.status,
      r.supplier.code,
      r.supplier.name,
      r.lots.map((l) => l.id).join(' '),
      r.lots.map((l) => l.poNumber).join(' '),
      r.rmaNumber,
      r.chargebackTotal.toFixed(2),
      r.currency,
      r.createdBy.name,
      utcMinute(r.createdAt),
    ]);
  }
}
