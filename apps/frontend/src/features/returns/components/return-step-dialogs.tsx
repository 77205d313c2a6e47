import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  Stack,
  TextField,
} from '@mui/material';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import {
  cancelSchema,
  creditSchema,
  shipSchema,
  useReturnStep,
} from '@/features/returns/api/return-steps';
import { formatMoney } from '@/features/returns/lib/chargeback';
import type { ReturnStep } from '@/features/returns/lib/return-steps';
import type { VendorReturn } from '@/features/returns/types';
import { todayIso } from '@/lib/dates';
import { errorMessage } from '@/lib/query-client';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

type DialogStep = Extract<ReturnStep, 'ship' | 'credit' | 'cancel'>;

const schemas = { ship: shipSchema, credit: creditSchema, cancel: cancelSchema };
const titles: Record<DialogStep, string> = {
  ship: 'Record the shipment',
  credit: 'Record the credit note',
  cancel: 'Cancel the return',
};

interface Field {
  name: string;
  label: string;
  type?: string;
  helper?: string;
  multiline?: boolean;
}

function fieldsOf(step: DialogStep, ret: VendorReturn): Field[] {
  const unit = ret.lots[0]?.unit ?? 'units';
  if (step === 'ship')
    return [
      { name: 'carrier', label: 'Carrier' },
      { name: 'trackingNumber', label: 'Tracking number' },
      { name: 'shippedOn', label: 'Ship date', type: 'date' },
      { name: 'quantity', label: `Quantity (${unit})`, type: 'number' },
    ];
  if (step === 'credit')
    return [
      { name: 'creditNoteNumber', label: 'Credit note number' },
      {
        name: 'creditAmount',
        label: `Amount credited (${ret.currency})`,
        type: 'number',
        helper: `Chargeback asked: ${formatMoney(ret.chargebackTotal, ret.currency)}`,
      },
    ];
  return [
    {
      name: 'reason',
      label: 'Reason',
      multiline: true,
      helper: 'Kept in the audit trail. The lots are freed for another return.',
    },
  ];
}

function defaults(step: DialogStep, ret: VendorReturn): Record<string, string> {
  if (step === 'ship')
    return {
      carrier: '',
      trackingNumber: '',
      shippedOn: todayIso(),
      quantity: String(ret.lots.reduce((n, l) => n + l.quantity, 0)),
    };
  if (step === 'credit') return { creditNoteNumber: '', creditAmount: String(ret.chargebackTotal) };
  return { reason: '' };
}

/** The steps that need facts: shipment, credit note, or the reason for cancelling. */
export function ReturnStepDialog({
  ret,
  step,
  onClose,
}: {
  ret: VendorReturn;
  step: DialogStep;
  onClose: () => void;
}) {
  const take = useReturnStep();
  const schema = schemas[step] as z.ZodType<Record<string, unknown>, Record<string, string>>;
  const form = useForm<Record<string, string>, unknown, Record<string, unknown>>({
    resolver: zodResolver(schema),
    mode: 'onChange',
    defaultValues: defaults(step, ret),
  });
  const fields = fieldsOf(step, ret);
  const { errors, isSubmitting } = form.formState;
  const formErrors = take.isError
    ? splitServerErrors(
        take.error,
        fields.map((f) => f.name),
      ).formErrors
    : [];

  const onSubmit = form.handleSubmit(async (body) => {
    try {
      const saved = await take.mutateAsync({ id: ret.id, step, version: ret.version, body });
      toasts.success(`Return ${saved.number}: ${titles[step].toLowerCase()} — done.`);
      onClose();
    } catch (error) {
      const { fieldErrors } = splitServerErrors(
        error,
        fields.map((f) => f.name),
      );
      for (const f of fields)
        if (fieldErrors[f.name])
          form.setError(f.name, { type: 'server', message: fieldErrors[f.name] });
    }
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label={titles[step]}>
        <DialogTitle>
          {titles[step]} · {ret.number}
        </DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            {step === 'cancel' && (
              <DialogContentText>
                A cancelled return counts in no scorecard. It stays on record with its reason.
              </DialogContentText>
            )}
            {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
            {take.isError && formErrors.length === 0 && !Object.keys(errors).length && (
              <Alert severity="error">{errorMessage(take.error)}</Alert>
            )}
            {fields.map((f) => (
              <TextField
                key={f.name}
                label={f.label}
                type={f.type ?? 'text'}
                multiline={f.multiline}
                minRows={f.multiline ? 3 : undefined}
                slotProps={f.type === 'date' ? { inputLabel: { shrink: true } } : undefined}
                error={!!errors[f.name]}
                helperText={errors[f.name]?.message ?? f.helper}
                {...form.register(f.name)}
              />
            ))}
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Back</Button>
          <Button
            type="submit"
            variant="contained"
            color={step === 'cancel' ? 'error' : 'primary'}
            loading={isSubmitting}
          >
            {titles[step]}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
