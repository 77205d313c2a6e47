import { useQuery } from '@tanstack/react-query';
import type { Decision } from '@/features/decisions/types';
import { lotQueryOptions } from '@/lib/lots-api';

interface LotWithDecisions {
  id: number;
  decisions: Decision[];
}

// The Lot page's own request and cache entry (lib/lots-api.ts), read for its decisions.
export const useLotDecisions = (lotId: number) =>
  useQuery({
    ...lotQueryOptions<LotWithDecisions>(lotId),
    select: (lot) => lot.decisions ?? [],
  });
