import { z } from 'zod';
import { api } from '@/lib/api-client';
import type { Reading } from '@/features/inspection/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { maxChars } from '@/lib/contract-rules';
import { TEXT_MIN } from '@gaugeproof/api-types';

export const VOID_REASON_MIN_LENGTH = TEXT_MIN.voidReason;

export const voidReadingSchema = z.object({
  reason: z
    .string()
    .trim()
    .min(VOID_REASON_MIN_LENGTH, `Say why, in at least ${VOID_REASON_MIN_LENGTH} characters.`)
    .max(...maxChars('reason')),
});
export type VoidReadingInput = z.infer<typeof voidReadingSchema>;

export const voidReading = (readingId: number, input: VoidReadingInput) =>
  api.post<Reading>(`/readings/${readingId}/void`, { reason: input.reason.trim() });

export function useVoidReading() {
  return useWriteMutation(
    ({ readingId, ...input }: VoidReadingInput & { readingId: number }) =>
      voidReading(readingId, input),
    {
      refresh: [queryKeys.lots.all],
    },
  );
}
