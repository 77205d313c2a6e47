import { PAGE_SIZE, type LotSummary } from '@gaugeproof/api-types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { getReturns } from '@/features/returns/api/get-returns';
import { getLots } from '@/lib/lots-api';
import { queryKeys } from '@/lib/query-keys';

/** A lot as GET /api/lots lists it: the contract's shape. */
export type ReturnableLot = LotSummary;

/**
 * A supplier's rejected lots that are not on an open return yet. A draft return keeps its
 * lots `rejected` (they become `returned` when it is e-mailed or shipped), so drafts are subtracted here.
 */
export async function getReturnableLots(supplierId: number, signal?: AbortSignal) {
  const [lots, open] = await Promise.all([
    getLots(
      { status: ['rejected'], supplierId, pageSize: PAGE_SIZE.max, sort: 'receivedAt:asc' },
      signal,
    ),
    getReturns(
      { supplierId: String(supplierId), status: 'draft', pageSize: String(PAGE_SIZE.max) },
      signal,
    ),
  ]);
  const taken = new Set(open.items.flatMap((r) => r.lots.map((l) => l.id)));
  return lots.items.filter((l) => !taken.has(l.id));
}

export const returnableLotsQueryOptions = (supplierId: number) =>
  queryOptions({
    queryKey: queryKeys.returns.returnableLots(supplierId),
    queryFn: ({ signal }) => getReturnableLots(supplierId, signal),
  });

export const useReturnableLots = (supplierId: number | null) =>
  useQuery({ ...returnableLotsQueryOptions(supplierId ?? 0), enabled: supplierId !== null });
