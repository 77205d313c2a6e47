import { Card, CardContent, Stack, Typography } from '@mui/material';
import { useState } from 'react';
import { VoidWithReasonDialog } from '@/components/void-with-reason-dialog';
import { useVoidPhoto, voidPhotoSchema } from '@/features/photos/api/void-photo';
import { PhotoGrid } from '@/features/photos/components/photo-grid';
import { PhotoUploader } from '@/features/photos/components/photo-uploader';
import { PhotoViewerDialog } from '@/features/photos/components/photo-viewer-dialog';
import type { Photo, PhotoSampleOption } from '@/features/photos/types';

interface PhotosPanelProps {
  lotId: number;
  photos: readonly Photo[];
  samples: readonly PhotoSampleOption[];
  canUpload: boolean;
  /** The lot went back to the supplier: its photos stay as sent, none is added. */
  frozen?: boolean;
  /** Whether the signed-in user may void this photo (the server checks again). */
  canVoid?: (photo: Photo) => boolean;
}

export function PhotosPanel({
  lotId,
  photos,
  samples,
  canUpload,
  frozen = false,
  canVoid,
}: PhotosPanelProps) {
  const [open, setOpen] = useState<Photo | null>(null);
  const [voiding, setVoiding] = useState<number | null>(null);
  const voidPhoto = useVoidPhoto();
  const live = photos.filter((p) => !p.voided).length;
  return (
    <Card>
      <CardContent>
        <Stack spacing={2}>
          <Typography variant="h4" component="h2">
            Photos ({live}
            {live !== photos.length ? `, ${photos.length - live} void` : ''})
          </Typography>
          <PhotoGrid
            photos={photos}
            samples={samples}
            onOpen={setOpen}
            emptyText={
              frozen
                ? 'No photo was taken before this lot was returned. Its evidence stays as the supplier received it.'
                : 'No photos yet. Photograph the label, the reel and each stripped sample.'
            }
          />
          {canUpload && <PhotoUploader lotId={lotId} samples={samples} />}
        </Stack>
      </CardContent>
      <PhotoViewerDialog
        photo={open}
        onClose={() => setOpen(null)}
        onVoid={
          open && canVoid?.(open)
            ? (photo) => {
                setOpen(null);
                setVoiding(photo.id);
              }
            : undefined
        }
      />
      {/* Photos are never deleted: a void one stays in the record, struck, with this reason. */}
      <VoidWithReasonDialog
        thing="photo"
        targetId={voiding}
        explanation="The photo stays in the lot's record, struck, with your reason; it is not deleted."
        examples="For example: wrong reel, blurred, shows another lot."
        schema={voidPhotoSchema}
        mutation={voidPhoto}
        onVoid={(photoId, reason) => voidPhoto.mutateAsync({ photoId, reason })}
        onClose={() => setVoiding(null)}
      />
    </Card>
  );
}
