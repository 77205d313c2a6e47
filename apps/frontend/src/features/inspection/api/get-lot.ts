import { useQuery } from '@tanstack/react-query';
import type { LotDetail } from '@/features/inspection/types';
import { lotQueryOptions } from '@/lib/lots-api';

export const useLot = (id: number) => useQuery(lotQueryOptions<LotDetail>(id));
