import { useQuery } from '@tanstack/react-query';
import { lotQueryOptions } from '@/lib/lots-api';

// The Lot page's own request and cache entry (lib/lots-api.ts), read for its decisions.
export const useLotDecisions = (lotId: number) =>
  useQuery({
    ...lotQueryOptions(lotId),
    select: (lot) => lot.decisions ?? [],
  });
