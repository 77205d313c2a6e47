import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { LotSummary } from '@/features/lots/types';
import { lotsQueryOptions, type LotListParams } from '@/lib/lots-api';

/** A page of lots; the previous page stays on screen while the next one loads. */
export const useLots = (params: LotListParams) =>
  useQuery({ ...lotsQueryOptions<LotSummary>(params), placeholderData: keepPreviousData });
