import { z } from 'zod';
import { api } from '@/lib/api-client';
import type { Photo } from '@/features/photos/types';
import { maxChars } from '@/lib/contract-rules';
import { TEXT_MIN } from '@gaugeproof/api-types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';

/** As the server (VoidPhotoDto): the contract's void reason, after trimming. */
export const voidPhotoSchema = z.object({
  reason: z
    .string()
    .trim()
    .min(TEXT_MIN.voidReason, `Say why, in at least ${TEXT_MIN.voidReason} characters.`)
    .max(...maxChars('reason')),
});
export type VoidPhotoInput = z.infer<typeof voidPhotoSchema>;

export const voidPhoto = (photoId: number, input: VoidPhotoInput) =>
  api.post<Photo>(`/photos/${photoId}/void`, { reason: input.reason.trim() });

export function useVoidPhoto() {
  return useWriteMutation(
    ({ photoId, ...input }: VoidPhotoInput & { photoId: number }) => voidPhoto(photoId, input),
    {
      refresh: [queryKeys.lots.all],
    },
  );
}
