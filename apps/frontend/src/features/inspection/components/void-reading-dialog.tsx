import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
} from '@mui/material';
import { useForm } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import {
  useVoidReading,
  voidReadingSchema,
  type VoidReadingInput,
} from '@/features/inspection/api/void-reading';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';

interface VoidReadingDialogProps {
  readingId: number | null;
  onClose: () => void;
}

/** Readings are never deleted: voiding keeps the reading visible, struck through, with this reason. */
export function VoidReadingDialog({ readingId, onClose }: VoidReadingDialogProps) {
  const voidReading = useVoidReading();
  const form = useForm<VoidReadingInput>({
    resolver: zodResolver(voidReadingSchema),
    mode: 'onChange',
    defaultValues: { reason: '' },
  });
  const { isSubmitting } = form.formState;

  const close = () => {
    form.reset({ reason: '' });
    voidReading.reset();
    onClose();
  };

  const onSubmit = form.handleSubmit(async (input) => {
    if (readingId === null) return;
    try {
      await voidReading.mutateAsync({ readingId, ...input });
      toasts.success('The reading is void. It stays in the record with your reason.');
      close();
    } catch {
      // shown below
    }
  });

  return (
    <Dialog open={readingId !== null} onClose={close} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label="Void reading">
        <DialogTitle>Void this reading?</DialogTitle>
        <DialogContent>
          <DialogContentText sx={{ mb: 2 }}>
            The reading stays visible, struck through, and no longer counts towards the sample's
            verdict.
          </DialogContentText>
          {voidReading.isError && <Alert severity="error">{errorMessage(voidReading.error)}</Alert>}
          <FormTextField
            control={form.control}
            name="reason"
            label="Reason"
            multiline
            minRows={2}
            fullWidth
            autoFocus
            helperText="For example: length mis-typed, sample not fully stripped."
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" color="error" variant="contained" loading={isSubmitting}>
            Void reading
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
