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
  Typography,
} from '@mui/material';
import { useForm } from 'react-hook-form';
import {
  emailReturnSchema,
  useEmailReturn,
  type EmailReturnInput,
} from '@/features/returns/api/email-return';
import { formatMoney } from '@/features/returns/lib/chargeback';
import type { VendorReturn } from '@/features/returns/types';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['to', 'message'] as const;

/**
 * Sends the supplier the return notice: an e-mail with a link to the supplier's own page of
 * what was found (lots, photos, evidence pack), the evidence pack and the readings attached.
 * Worded for the buyer: what the supplier gets, and where their answer comes back.
 */
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
      if (message.status === 'sent')
        toasts.success(`The return notice went to ${message.to}. Their reply comes to you.`);
      else if (message.status === 'logged')
        toasts.show(
          `No mail server is set: the message to ${message.to} is stored, not sent.`,
          'warning',
        );
      else
        toasts.error(
          `The e-mail to ${message.to} did not go yet: ${message.error ?? message.status}. It is tried again by itself; see Messages.`,
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
        <DialogTitle>Send the return notice to {ret.supplier.name}</DialogTitle>
        <DialogContent>
          <DialogContentText component="div" sx={{ mb: 1 }}>
            <Typography sx={{ mb: 1 }}>
              {ret.supplier.name} gets one e-mail telling them the goods on {ret.number} failed our
              inspection and are coming back. It holds:
            </Typography>
            <ul style={{ margin: 0, paddingLeft: '1.25rem' }}>
              <li>
                {ret.supplierNote?.trim()
                  ? `your note to the supplier: “${ret.supplierNote.trim()}”`
                  : 'no note to the supplier yet (add one under “RMA, notes and costs” so they read why)'}
              </li>
              <li>the chargeback, {formatMoney(ret.chargebackTotal, ret.currency)}</li>
              <li>
                a link to a page of their own showing what we found (the lots, their photos and the
                evidence pack), no account needed, working for 30 days
              </li>
              <li>the evidence pack (PDF) and the readings (CSV), attached</li>
            </ul>
            <Typography sx={{ mt: 1 }}>
              Your internal notes and the QA lead's reason are not sent. Their reply comes to your
              own e-mail address. The e-mail is kept under Messages, and tried again by itself if it
              does not go through.
            </Typography>
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
                ? "The supplier's quality contact; change it for this notice only"
                : 'The supplier has no contact e-mail: type one.')
            }
            {...form.register('to')}
          />
          <TextField
            label="A line of your own (optional)"
            multiline
            minRows={3}
            error={!!errors.message}
            helperText={
              errors.message?.message ?? 'Goes at the top of the e-mail, before the text above.'
            }
            {...form.register('message')}
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            Send the notice
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
