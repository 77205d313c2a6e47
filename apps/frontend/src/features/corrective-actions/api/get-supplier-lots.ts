import { PAGE_SIZE, type LotSummary } from '@gaugeproof/api-types';
import { useQuery } from '@tanstack/react-query';
import { lotsQueryOptions } from '@/lib/lots-api';

/** A lot as GET /api/lots lists it: the contract's shape. */
export type SupplierLot = LotSummary;

/** The supplier's decided lots (the ones a corrective action is about), newest first. */
const DECIDED = ['rejected', 'accepted_on_concession', 'returned', 'accepted'];

export const supplierLotsQueryOptions = (supplierId: number) =>
  lotsQueryOptions({
    supplierId,
    status: DECIDED,
    pageSize: PAGE_SIZE.max,
    sort: 'receivedAt:desc',
  });

export const useSupplierLots = (supplierId: number | null) =>
  useQuery({ ...supplierLotsQueryOptions(supplierId ?? 0), enabled: supplierId !== null });
