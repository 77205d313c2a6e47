import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { LotSummary } from '@/features/lots/types';

export interface RejectReachedLot extends LotSummary {
  /** Units of the plan with a live nonconforming reading. */
  nonconformingUnits: number;
  /** The plan's reject number Re. */
  reject: number;
}

/** GET /api/inspection/reject-reached (QA lead, admin): lots at their reject number. */
export const useRejectReachedLots = () =>
  useQuery({
    queryKey: ['lots', 'reject-reached'],
    queryFn: ({ signal }) =>
      api.get<{ items: RejectReachedLot[]; total: number }>('/inspection/reject-reached', signal),
  });
