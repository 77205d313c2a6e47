import type { CsvRow } from '../common/csv';
import type { ReturnView } from './return-view';

export const RETURN_LIST_HEADER = [
  'number',
  'status',
  'supplierCode',
  'supplierName',
  'lotIds',
  'poNumbers',
  'rmaNumber',
  'chargebackTotal',
  'createdBy',
  'createdAt',
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
      r.chargebackTotal,
      r.createdBy.name,
      r.createdAt.toISOString(),
    ]);
  }
}
