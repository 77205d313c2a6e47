import { ImageList, ImageListItem, ImageListItemBar, Typography } from '@mui/material';
import type { Photo, PhotoSampleOption } from '@/features/photos/types';

interface PhotoGridProps {
  photos: readonly Photo[];
  samples: readonly PhotoSampleOption[];
  onOpen: (photo: Photo) => void;
}

export function PhotoGrid({ photos, samples, onOpen }: PhotoGridProps) {
  if (photos.length === 0) {
    return (
      <Typography color="text.secondary">
        No photos yet. Photograph the label, the reel and each stripped sample.
      </Typography>
    );
  }
  const sampleLabel = (id: number | null) => samples.find((s) => s.id === id)?.label ?? 'Lot';
  return (
    <ImageList cols={4} gap={8} rowHeight={140} aria-label="Photos">
      {photos.map((photo) => (
        <ImageListItem key={photo.id} onClick={() => onOpen(photo)} sx={{ cursor: 'pointer' }}>
          <img
            src={photo.thumbnailUrl}
            alt={photo.caption ?? `Photo ${photo.id}`}
            loading="lazy"
            style={{ objectFit: 'cover', height: 140 }}
          />
          <ImageListItemBar
            title={photo.caption ?? 'No caption'}
            subtitle={sampleLabel(photo.sampleId)}
          />
        </ImageListItem>
      ))}
    </ImageList>
  );
}
