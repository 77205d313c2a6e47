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
  emailReturnSchema,
  useEmailReturn,
  type EmailReturnInput,
} from '@/features/returns/api/email-return';
import type { VendorReturn } from '@/features/returns/types';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['to', 'message'] as const;

/** Sends the supplier the notice with the readings CSV and the evidence pack attached. */
export function EmailSupplierDialog({ ret, onClose }: { ret: VendorReturn; onClose: () => void }) {
  const send = useEmailReturn();
  const form = useForm<EmailReturnInput>({
    resolver: zodResolver(emailReturnSchema),
    mode: 'onChange',
    defaultValues: { to: ret.supplier.contactEmail ?? '', message: '' },
  });
  const { errors, isSubmitting } = form.formState;
  const formErrors = send.isError ? splitServerErrors(send.error, FIELDS).formErrors : [];

  const onSubmit = form.handleSubmit(async (input) => {
    try {
      const message = await send.mutateAsync({ id: ret.id, input });
      if (message.status === 'sent') toasts.success(`The notice went to ${message.to}.`);
      else if (message.status === 'logged')
        toasts.show(
          `No mail server is set: the message to ${message.to} is stored, not sent.`,
          'warning',
        );
      else
        toasts.error(
          `The message to ${message.to} failed: ${message.error ?? message.status}. Retry it from the list.`,
        );
      onClose();
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      if (fieldErrors.to) form.setError('to', { type: 'server', message: fieldErrors.to });
      if (fieldErrors.message)
        form.setError('message', { type: 'server', message: fieldErrors.message });
    }
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label="E-mail supplier">
        <DialogTitle>E-mail {ret.supplier.name}</DialogTitle>
        <DialogContent>
          <DialogContentText sx={{ mb: 1 }}>
            The notice for {ret.number} goes with the readings CSV and the evidence pack (PDF)
            attached. Every message is kept with its status.
          </DialogContentText>
          {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
          <TextField
            label="To"
            type="email"
            required
            error={!!errors.to}
            helperText={
              errors.to?.message ??
              (ret.supplier.contactEmail
                ? "The supplier's contact"
                : 'The supplier has no contact e-mail: type one.')
            }
            {...form.register('to')}
          />
          <TextField
            label="Message (optional)"
            multiline
            minRows={3}
            error={!!errors.message}
            helperText={errors.message?.message ?? 'Shown above the standard text.'}
            {...form.register('message')}
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            Send
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
