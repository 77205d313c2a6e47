import {
  ImageList,
  ImageListItem,
  ImageListItemBar,
  Typography,
  useMediaQuery,
} from '@mui/material';
import type { Theme } from '@mui/material/styles';
import type { Photo, PhotoSampleOption } from '@/features/photos/types';

interface PhotoGridProps {
  photos: readonly Photo[];
  samples: readonly PhotoSampleOption[];
  onOpen: (photo: Photo) => void;
  /** What an empty grid says. */
  emptyText: string;
}

export function PhotoGrid({ photos, samples, onOpen, emptyText }: PhotoGridProps) {
  const phone = useMediaQuery((theme: Theme) => theme.breakpoints.down('sm'));
  if (photos.length === 0) {
    return <Typography color="text.secondary">{emptyText}</Typography>;
  }
  const sampleLabel = (id: number | null) => samples.find((s) => s.id === id)?.label ?? 'Lot';
  return (
    <ImageList cols={phone ? 2 : 4} gap={8} rowHeight={140} aria-label="Photos">
      {photos.map((photo) => (
        <ImageListItem
          key={photo.id}
          onClick={() => onOpen(photo)}
          sx={{ cursor: 'pointer' }}
          data-voided={photo.voided || undefined}
        >
          <img
            src={photo.thumbnailUrl}
            alt={photo.caption ?? `Photo ${photo.id}`}
            loading="lazy"
            style={{
              objectFit: 'cover',
              height: 140,
              ...(photo.voided ? { filter: 'grayscale(1)', opacity: 0.45 } : {}),
            }}
          />
          <ImageListItemBar
            title={
              photo.voided ? (
                <s aria-label={`Void: ${photo.caption ?? `Photo ${photo.id}`}`}>
                  {photo.caption ?? 'No caption'}
                </s>
              ) : (
                (photo.caption ?? 'No caption')
              )
            }
            subtitle={
              photo.voided ? `Void: ${photo.voidReason ?? ''}` : sampleLabel(photo.sampleId)
            }
          />
        </ImageListItem>
      ))}
    </ImageList>
  );
}
