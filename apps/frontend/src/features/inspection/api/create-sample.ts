import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Sample } from '@/features/inspection/types';
import { queryKeys } from '@/lib/query-keys';

export interface CreateSampleRequest {
  conductorId: number;
  /** Which physical unit the piece was cut from ("spool 7"), if the clerk notes it. */
  unitRef?: string;
  /** Unit number 1..n of the plan; the server takes the next free unit when omitted. */
  seq?: number;
  /** A UUID made on the device: a repeat is answered with the sample it made the first time. */
  clientId?: string;
}

export const createSample = (lotId: number, request: CreateSampleRequest) =>
  api.post<Sample>(`/lots/${lotId}/samples`, request);

export function useCreateSample(lotId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: CreateSampleRequest) => createSample(lotId, request),
    meta: { inlineErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.lots.all }),
  });
}
