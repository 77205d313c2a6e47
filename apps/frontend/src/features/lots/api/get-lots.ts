import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { lotsQueryOptions, type LotListParams } from '@/lib/lots-api';

/** A page of lots; the previous page stays on screen while the next one loads. */
export const useLots = (params: LotListParams) =>
  useQuery({ ...lotsQueryOptions(params), placeholderData: keepPreviousData });
