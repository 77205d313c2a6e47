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
import type { ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormTextField } from '@/components/form/form-text-field';
import { errorMessage } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';

interface VoidWithReasonDialogProps {
  /** What is voided, as the user says it: "reading", "photo". */
  thing: string;
  /** The id of the record being voided; the dialog is open while there is one. */
  targetId: number | null;
  /** What voiding does to the record, above the reason. */
  explanation: ReactNode;
  /** Examples of a reason, under the field. */
  examples: string;
  /** The feature's form schema for the reason (the contract's length rule). */
  schema: z.ZodType<{ reason: string }, { reason: string }>;
  /** The void mutation: its error shows in the dialog, and closing resets it. */
  mutation: { isError: boolean; error: unknown; reset: () => void };
  /** Sends the void; the dialog closes once it is done and stays open with the error if it fails. */
  onVoid: (targetId: number, reason: string) => Promise<unknown>;
  onClose: () => void;
}

/**
 * Nothing in the record is deleted: a reading or a photo is voided with a reason, stays
 * visible (struck) and no longer counts. The one dialog that asks for that reason.
 */
export function VoidWithReasonDialog({
  thing,
  targetId,
  explanation,
  examples,
  schema,
  mutation,
  onVoid,
  onClose,
}: VoidWithReasonDialogProps) {
  const form = useForm<{ reason: string }>({
    resolver: zodResolver(schema),
    mode: 'onChange',
    defaultValues: { reason: '' },
  });
  const { isSubmitting } = form.formState;

  const close = () => {
    form.reset({ reason: '' });
    mutation.reset();
    onClose();
  };

  const onSubmit = form.handleSubmit(async ({ reason }) => {
    if (targetId === null) return;
    try {
      await onVoid(targetId, reason);
      toasts.success(`The ${thing} is void. It stays in the record with your reason.`);
      close();
    } catch {
      // shown below
    }
  });

  return (
    <Dialog open={targetId !== null} onClose={close} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label={`Void ${thing}`}>
        <DialogTitle>Void this {thing}?</DialogTitle>
        <DialogContent>
          <DialogContentText sx={{ mb: 2 }}>{explanation}</DialogContentText>
          {mutation.isError && <Alert severity="error">{errorMessage(mutation.error)}</Alert>}
          <FormTextField
            control={form.control}
            name="reason"
            label="Reason"
            multiline
            minRows={2}
            fullWidth
            autoFocus
            helperText={examples}
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" color="error" variant="contained" loading={isSubmitting}>
            Void {thing}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
