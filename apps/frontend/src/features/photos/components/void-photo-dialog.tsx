import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  TextField,
} from '@mui/material';
import { useForm } from 'react-hook-form';
import {
  useVoidPhoto,
  voidPhotoSchema,
  type VoidPhotoInput,
} from '@/features/photos/api/void-photo';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';

interface VoidPhotoDialogProps {
  photoId: number | null;
  onClose: () => void;
}

/** Photos are never deleted: a void one stays in the record, struck, with this reason. */
export function VoidPhotoDialog({ photoId, onClose }: VoidPhotoDialogProps) {
  const voidPhoto = useVoidPhoto();
  const form = useForm<VoidPhotoInput>({
    resolver: zodResolver(voidPhotoSchema),
    mode: 'onChange',
    defaultValues: { reason: '' },
  });
  const { errors, isSubmitting } = form.formState;

  const close = () => {
    form.reset({ reason: '' });
    voidPhoto.reset();
    onClose();
  };

  const onSubmit = form.handleSubmit(async (input) => {
    if (photoId === null) return;
    try {
      await voidPhoto.mutateAsync({ photoId, ...input });
      toasts.success('The photo is void. It stays in the record with your reason.');
      close();
    } catch {
      // shown below
    }
  });

  return (
    <Dialog open={photoId !== null} onClose={close} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label="Void photo">
        <DialogTitle>Void this photo?</DialogTitle>
        <DialogContent>
          <DialogContentText sx={{ mb: 2 }}>
            The photo stays in the lot's record, struck, with your reason; it is not deleted.
          </DialogContentText>
          {voidPhoto.isError && <Alert severity="error">{errorMessage(voidPhoto.error)}</Alert>}
          <TextField
            label="Reason"
            multiline
            minRows={2}
            fullWidth
            autoFocus
            error={!!errors.reason}
            helperText={
              errors.reason?.message ?? 'For example: wrong reel, blurred, shows another lot.'
            }
            {...form.register('reason')}
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" color="error" variant="contained" loading={isSubmitting}>
            Void photo
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
