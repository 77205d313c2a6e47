import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Button, Checkbox, FormControlLabel, Stack, TextField } from '@mui/material';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { costsFromForm, costsToForm } from '@/features/returns/api/cost-schema';
import {
  editReturnSchema,
  useUpdateReturn,
  type EditReturnForm,
} from '@/features/returns/api/update-return';
import { CostFields } from '@/features/returns/components/cost-fields';
import { draftOnly } from '@/features/returns/lib/return-steps';
import type { VendorReturn } from '@/features/returns/types';
import { isApiError } from '@/lib/api-client';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['rmaNumber', 'notes', 'supplierNote', 'currency', 'costs'] as const;

const formOf = (r: VendorReturn): EditReturnForm => ({
  rmaNumber: r.rmaNumber ?? '',
  notes: r.notes ?? '',
  supplierNote: r.supplierNote ?? '',
  shareDecisionReason: r.shareDecisionReason,
  currency: r.currency,
  costs: costsToForm(r.costs),
});

/**
 * RMA number, notes (internal, and the note to the supplier) of an open return; its costs
 * and currency while a draft. Saved on the version loaded: a 409 says someone saved first.
 */
export function EditReturnForm({ ret }: { ret: VendorReturn }) {
  const update = useUpdateReturn({ inlineErrors: true });
  const draft = draftOnly(ret.status);
  const form = useForm<EditReturnForm>({
    resolver: zodResolver(editReturnSchema),
    mode: 'onChange',
    defaultValues: formOf(ret),
  });
  const { errors, isSubmitting, isDirty } = form.formState;
  const costs = useWatch({ control: form.control, name: 'costs' });
  const currency = useWatch({ control: form.control, name: 'currency' });
  const serverErrors = update.isError ? splitServerErrors(update.error, FIELDS) : null;
  const stale = update.isError && isApiError(update.error) && update.error.status === 409;

  const onSubmit = form.handleSubmit(async (input) => {
    try {
      const saved = await update.mutateAsync({
        id: ret.id,
        patch: {
          version: ret.version,
          rmaNumber: input.rmaNumber.trim(),
          notes: input.notes.trim(),
          supplierNote: input.supplierNote.trim(),
          shareDecisionReason: input.shareDecisionReason,
          ...(draft
            ? { costs: costsFromForm(input.costs), currency: input.currency.trim().toUpperCase() }
            : {}),
        },
      });
      form.reset(formOf(saved));
      toasts.success(`Return ${saved.number} is saved.`);
    } catch (error) {
      // A 409 carries the return as it is now (docs/api-conventions.md).
      const body = isApiError(error) && error.status === 409 ? error.body : null;
      const current = (body as { current?: VendorReturn } | null)?.current;
      if (current) form.reset(formOf(current));
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const f of ['rmaNumber', 'notes', 'supplierNote', 'currency'] as const) {
        if (fieldErrors[f]) form.setError(f, { type: 'server', message: fieldErrors[f] });
      }
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Edit return">
      <Stack spacing={2}>
        {stale ? (
          <Alert severity="warning">
            Someone changed this return first. The form shows it as it is now; your changes were not
            saved, make them again.
          </Alert>
        ) : (
          serverErrors &&
          serverErrors.formErrors.length > 0 && (
            <Alert severity="error">{serverErrors.formErrors.join(' ')}</Alert>
          )
        )}
        <TextField
          label="Supplier RMA number"
          error={!!errors.rmaNumber}
          helperText={errors.rmaNumber?.message}
          {...form.register('rmaNumber')}
        />
        <TextField
          label="Note to the supplier"
          multiline
          minRows={2}
          error={!!errors.supplierNote}
          helperText={
            errors.supplierNote?.message ??
            'Goes into the e-mail and the evidence pack: why the goods come back.'
          }
          {...form.register('supplierNote')}
        />
        <Controller
          control={form.control}
          name="shareDecisionReason"
          render={({ field }) => (
            <FormControlLabel
              control={
                <Checkbox
                  checked={field.value}
                  onChange={(e) => field.onChange(e.target.checked)}
                />
              }
              label="Also show the QA lead's reason for the decision to the supplier"
            />
          )}
        />
        <TextField
          label="Internal notes"
          multiline
          minRows={2}
          error={!!errors.notes}
          helperText={errors.notes?.message ?? 'Stay inside the company; never sent.'}
          {...form.register('notes')}
        />
        {draft && (
          <>
            <TextField
              label="Currency"
              sx={{ maxWidth: 160 }}
              slotProps={{ htmlInput: { maxLength: 3, style: { textTransform: 'uppercase' } } }}
              error={!!errors.currency}
              helperText={errors.currency?.message ?? 'ISO 4217 code'}
              {...form.register('currency')}
            />
            <CostFields
              costs={costs}
              currency={/^[A-Za-z]{3}$/.test(currency) ? currency.toUpperCase() : undefined}
              register={(name) => form.register(`costs.${name}`)}
              errors={errors.costs}
            />
          </>
        )}
        <div>
          <Button type="submit" variant="outlined" disabled={!isDirty} loading={isSubmitting}>
            Save changes
          </Button>
        </div>
      </Stack>
    </form>
  );
}
