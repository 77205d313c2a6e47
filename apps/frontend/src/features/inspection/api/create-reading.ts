import { api } from '@/lib/api-client';
import type { ReadingRequest } from '@/features/inspection/lib/reading-form';
import type { Reading } from '@/features/inspection/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';

export const createReading = (sampleId: number, request: ReadingRequest) =>
  api.post<Reading>(`/samples/${sampleId}/readings`, request);

/** Records a reading; the lot (status, evaluation) and the lists change with it. */
export function useCreateReading(sampleId: number) {
  return useWriteMutation((request: ReadingRequest) => createReading(sampleId, request), {
    refresh: [queryKeys.lots.all],
  });
}
