import {
  Alert,
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
  onVoid,
}: {
  photo: Photo | null;
  onClose: () => void;
  /** Offered when the signed-in user may void this photo. */
  onVoid?: (photo: Photo) => void;
}) {
  return (
    <Dialog open={photo !== null} onClose={onClose} maxWidth="lg">
      {photo && (
        <>
          <DialogTitle>
            {photo.voided ? <s>{photo.caption ?? 'Photo'}</s> : (photo.caption ?? 'Photo')}
          </DialogTitle>
          <DialogContent>
            {photo.voided && (
              <Alert severity="warning" sx={{ mb: 1.5 }}>
                Void: {photo.voidReason}
                {photo.voidedBy && photo.voidedAt
                  ? ` (${photo.voidedBy.name}, ${formatDateTime(photo.voidedAt)})`
                  : ''}
                . It stays in the record and no longer counts as evidence.
              </Alert>
            )}
            <img
              src={photo.url}
              alt={photo.caption ?? 'Lot photo, original'}
              style={{
                maxWidth: '100%',
                maxHeight: '70vh',
                display: 'block',
                ...(photo.voided ? { filter: 'grayscale(1)', opacity: 0.6 } : {}),
              }}
            />
            <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 1 }}>
              {photo.width} × {photo.height} px · {(photo.sizeBytes / 1024).toFixed(0)} kB ·
              uploaded {photo.uploadedBy ? `by ${photo.uploadedBy.name}, ` : ''}
              {formatDateTime(photo.createdAt)} · SHA-256{' '}
              <span style={{ fontFamily: 'monospace', wordBreak: 'break-all' }}>
                {photo.sha256}
              </span>
            </Typography>
          </DialogContent>
          <DialogActions>
            <Link href={photo.url} target="_blank" rel="noopener" sx={{ mr: 'auto', ml: 2 }}>
              Open the original
            </Link>
            {onVoid && !photo.voided && (
              <Button color="error" onClick={() => onVoid(photo)}>
                Void…
              </Button>
            )}
            <Button onClick={onClose}>Close</Button>
          </DialogActions>
        </>
      )}
    </Dialog>
  );
}
