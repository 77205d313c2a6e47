import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { rangeQuery } from '@/features/scorecards/api/get-scorecards';
import type { DateRange, SupplierScorecard } from '@/features/scorecards/types';
import { queryKeys } from '@/lib/query-keys';

export const getSupplierScorecard = (supplierId: number, range: DateRange, signal?: AbortSignal) =>
  api.get<SupplierScorecard>(`/suppliers/${supplierId}/scorecard${rangeQuery(range)}`, signal);

export const supplierScorecardQueryOptions = (supplierId: number, range: DateRange) =>
  queryOptions({
    queryKey: queryKeys.scorecards.supplier(supplierId, range),
    queryFn: ({ signal }) => getSupplierScorecard(supplierId, range, signal),
    placeholderData: keepPreviousData,
  });

export const useSupplierScorecard = (supplierId: number, range: DateRange) =>
  useQuery(supplierScorecardQueryOptions(supplierId, range));
