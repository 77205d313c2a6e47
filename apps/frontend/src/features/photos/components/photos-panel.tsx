import { Card, CardContent, Stack, Typography } from '@mui/material';
import { useState } from 'react';
import { PhotoGrid } from '@/features/photos/components/photo-grid';
import { PhotoUploader } from '@/features/photos/components/photo-uploader';
import { PhotoViewerDialog } from '@/features/photos/components/photo-viewer-dialog';
import type { Photo, PhotoSampleOption } from '@/features/photos/types';

interface PhotosPanelProps {
  lotId: number;
  photos: readonly Photo[];
  samples: readonly PhotoSampleOption[];
  canUpload: boolean;
}

export function PhotosPanel({ lotId, photos, samples, canUpload }: PhotosPanelProps) {
  const [open, setOpen] = useState<Photo | null>(null);
  return (
    <Card>
      <CardContent>
        <Stack spacing={2}>
          <Typography variant="h4" component="h2">
            Photos ({photos.length})
          </Typography>
          <PhotoGrid photos={photos} samples={samples} onOpen={setOpen} />
          {canUpload && <PhotoUploader lotId={lotId} samples={samples} />}
        </Stack>
      </CardContent>
      <PhotoViewerDialog photo={open} onClose={() => setOpen(null)} />
    </Card>
  );
}
