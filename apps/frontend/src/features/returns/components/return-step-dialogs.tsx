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
import { FormTextField } from '@/components/form/form-text-field';
import { submitWithServerErrors } from '@/components/form/server-errors';
import { todayIso } from '@/lib/dates';
import { splitServerErrors } from '@/lib/server-field-errors';
import { errorMessage } from '@/lib/query-client';
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
  const names = fields.map((f) => f.name);
  const { errors, isSubmitting } = form.formState;
  const formErrors = take.isError ? splitServerErrors(take.error, names).formErrors : [];

  const onSubmit = submitWithServerErrors(form, names, async (body) => {
    const saved = await take.mutateAsync({ id: ret.id, step, version: ret.version, body });
    toasts.success(`Return ${saved.number}: ${titles[step].toLowerCase()} — done.`);
    onClose();
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
              <FormTextField
                key={f.name}
                control={form.control}
                name={f.name}
                label={f.label}
                type={f.type ?? 'text'}
                multiline={f.multiline}
                minRows={f.multiline ? 3 : undefined}
                slotProps={f.type === 'date' ? { inputLabel: { shrink: true } } : undefined}
                helperText={f.helper}
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
