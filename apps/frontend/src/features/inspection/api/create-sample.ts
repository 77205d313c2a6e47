import { api } from '@/lib/api-client';
import type { Sample } from '@/features/inspection/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';

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
  return useWriteMutation((request: CreateSampleRequest) => createSample(lotId, request), {
    refresh: [queryKeys.lots.all],
  });
}
