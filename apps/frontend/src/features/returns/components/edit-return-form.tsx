import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Button, Checkbox, FormControlLabel, Stack } from '@mui/material';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { ServerErrorAlert, submitWithServerErrors } from '@/components/form/server-errors';
import { costsFromForm, costsToForm } from '@/features/returns/api/cost-schema';
import {
  editReturnSchema,
  useUpdateReturn,
  type EditReturnForm,
} from '@/features/returns/api/update-return';
import { COST_PATHS, CostFields } from '@/features/returns/components/cost-fields';
import { draftOnly } from '@/features/returns/lib/return-steps';
import type { VendorReturn } from '@/features/returns/types';
import { isApiError } from '@/lib/api-client';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['rmaNumber', 'notes', 'supplierNote', 'currency', ...COST_PATHS] as const;

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
  const { isSubmitting, isDirty } = form.formState;
  const costs = useWatch({ control: form.control, name: 'costs' });
  const currency = useWatch({ control: form.control, name: 'currency' });
  const stale = update.isError && isApiError(update.error) && update.error.status === 409;

  const onSubmit = submitWithServerErrors(form, FIELDS, async (input) => {
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
      throw error;
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
          <ServerErrorAlert error={update.error} fields={FIELDS} />
        )}
        <FormTextField control={form.control} name="rmaNumber" label="Supplier RMA number" />
        <FormTextField
          control={form.control}
          name="supplierNote"
          label="Note to the supplier"
          multiline
          minRows={2}
          helperText="Goes into the e-mail and the evidence pack: why the goods come back."
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
        <FormTextField
          control={form.control}
          name="notes"
          label="Internal notes"
          multiline
          minRows={2}
          helperText="Stay inside the company; never sent."
        />
        {draft && (
          <>
            <FormTextField
              control={form.control}
              name="currency"
              label="Currency"
              sx={{ maxWidth: 160 }}
              slotProps={{ htmlInput: { maxLength: 3, style: { textTransform: 'uppercase' } } }}
              helperText="ISO 4217 code"
            />
            <CostFields
              control={form.control}
              costs={costs}
              currency={/^[A-Za-z]{3}$/.test(currency) ? currency.toUpperCase() : undefined}
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
