import {
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Link,
  Typography,
} from '@mui/material';
import type { Photo } from '@/features/photos/types';
import { formatDateTime } from '@/lib/dates';

export function PhotoViewerDialog({
  photo,
  onClose,
}: {
  photo: Photo | null;
  onClose: () => void;
}) {
  return (
    <Dialog open={photo !== null} onClose={onClose} maxWidth="lg">
      {photo && (
        <>
          <DialogTitle>{photo.caption ?? 'Photo'}</DialogTitle>
          <DialogContent>
            <img
              src={photo.url}
              alt={photo.caption ?? 'Lot photo, original'}
              style={{ maxWidth: '100%', maxHeight: '70vh', display: 'block' }}
            />
            <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 1 }}>
              {photo.width} × {photo.height} px · {(photo.sizeBytes / 1024).toFixed(0)} kB ·
              uploaded by {photo.uploadedBy.name}, {formatDateTime(photo.createdAt)} · SHA-256{' '}
              <span style={{ fontFamily: 'monospace', wordBreak: 'break-all' }}>
                {photo.sha256}
              </span>
            </Typography>
          </DialogContent>
          <DialogActions>
            <Link href={photo.url} target="_blank" rel="noopener" sx={{ mr: 'auto', ml: 2 }}>
              Open the original
            </Link>
            <Button onClick={onClose}>Close</Button>
          </DialogActions>
        </>
      )}
    </Dialog>
  );
}
