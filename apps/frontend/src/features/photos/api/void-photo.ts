import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import type { Photo } from '@/features/photos/types';

/** As the server (VoidPhotoDto): 10 to 2000 characters after trimming. */
export const voidPhotoSchema = z.object({
  reason: z
    .string()
    .trim()
    .min(10, 'Say why, in at least 10 characters.')
    .max(2000, 'At most 2000 characters.'),
});
export type VoidPhotoInput = z.infer<typeof voidPhotoSchema>;

export const voidPhoto = (photoId: number, input: VoidPhotoInput) =>
  api.post<Photo>(`/photos/${photoId}/void`, { reason: input.reason.trim() });

export function useVoidPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ photoId, ...input }: VoidPhotoInput & { photoId: number }) =>
      voidPhoto(photoId, input),
    meta: { inlineErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['lots'] }),
  });
}
