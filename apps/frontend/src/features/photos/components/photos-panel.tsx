import { Card, CardContent, Stack, Typography } from '@mui/material';
import { useState } from 'react';
import { PhotoGrid } from '@/features/photos/components/photo-grid';
import { PhotoUploader } from '@/features/photos/components/photo-uploader';
import { PhotoViewerDialog } from '@/features/photos/components/photo-viewer-dialog';
import { VoidPhotoDialog } from '@/features/photos/components/void-photo-dialog';
import type { Photo, PhotoSampleOption } from '@/features/photos/types';

interface PhotosPanelProps {
  lotId: number;
  photos: readonly Photo[];
  samples: readonly PhotoSampleOption[];
  canUpload: boolean;
  /** Whether the signed-in user may void this photo (the server checks again). */
  canVoid?: (photo: Photo) => boolean;
}

export function PhotosPanel({ lotId, photos, samples, canUpload, canVoid }: PhotosPanelProps) {
  const [open, setOpen] = useState<Photo | null>(null);
  const [voiding, setVoiding] = useState<number | null>(null);
  const live = photos.filter((p) => !p.voided).length;
  return (
    <Card>
      <CardContent>
        <Stack spacing={2}>
          <Typography variant="h4" component="h2">
            Photos ({live}
            {live !== photos.length ? `, ${photos.length - live} void` : ''})
          </Typography>
          <PhotoGrid photos={photos} samples={samples} onOpen={setOpen} />
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
      <VoidPhotoDialog photoId={voiding} onClose={() => setVoiding(null)} />
    </Card>
  );
}
