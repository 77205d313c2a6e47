import type { RejectReached } from '@gaugeproof/api-types';
import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

/** A lot at its reject number: its plan's units with a live nonconforming reading and Re. */
export type RejectReachedLot = RejectReached['items'][number];

/** GET /api/inspection/reject-reached (QA lead, admin): lots at their reject number. */
export const useRejectReachedLots = () =>
  useQuery({
    queryKey: queryKeys.lots.rejectReached(),
    queryFn: ({ signal }) => api.get<RejectReached>('/inspection/reject-reached', signal),
  });
