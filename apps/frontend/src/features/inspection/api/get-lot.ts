import { useQuery } from '@tanstack/react-query';
import { lotQueryOptions } from '@/lib/lots-api';

export const useLot = (id: number) => useQuery(lotQueryOptions(id));
