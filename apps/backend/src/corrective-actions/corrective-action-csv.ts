import type { CsvRow } from '../common/csv';
import type { CorrectiveActionView } from './corrective-action-view';

export const CAR_CSV_HEADER = [
  'number',
  'status',
  'supplierCode',
  'supplierName',
  'lotIds',
  'problem',
  'dueOn',
  'overdue',
  'containment',
  'rootCause',
  'correctiveAction',
  'respondedAt',
  'closedAt',
  'createdAt',
] as const;

export async function* correctiveActionRows(
  blocks: AsyncIterable<CorrectiveActionView[]>,
): AsyncGenerator<CsvRow[]> {
  for await (const block of blocks) {
    yield block.map((c) => [
      c.number,
      c.status,
      c.supplier.code,
      c.supplier.name,
      c.lots.map((l) => l.id).join(' '),
      c.problem,
      c.dueOn,
      c.overdue ? 'yes' : 'no',
      c.containment,
      c.rootCause,
      c.correctiveAction,
      c.respondedAt?.toISOString() ?? null,
      c.closedAt?.toISOString() ?? null,
      c.createdAt.toISOString(),
    ]);
  }
}
