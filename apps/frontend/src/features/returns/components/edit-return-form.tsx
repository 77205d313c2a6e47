import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Button, Stack, TextField } from '@mui/material';
import { useForm, useWatch } from 'react-hook-form';
import { costsFromForm, costsToForm } from '@/features/returns/api/cost-schema';
import {
  editReturnSchema,
  useUpdateReturn,
  type EditReturnForm,
} from '@/features/returns/api/update-return';
import { CostFields } from '@/features/returns/components/cost-fields';
import type { VendorReturn } from '@/features/returns/types';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['rmaNumber', 'notes', 'costs'] as const;

/** RMA number, notes and costs of an open return. */
export function EditReturnForm({ ret }: { ret: VendorReturn }) {
  const update = useUpdateReturn({ inlineErrors: true });
  const form = useForm<EditReturnForm>({
    resolver: zodResolver(editReturnSchema),
    mode: 'onChange',
    defaultValues: {
      rmaNumber: ret.rmaNumber ?? '',
      notes: ret.notes ?? '',
      costs: costsToForm(ret.costs),
    },
  });
  const { errors, isSubmitting, isDirty } = form.formState;
  const costs = useWatch({ control: form.control, name: 'costs' });
  const serverErrors = update.isError ? splitServerErrors(update.error, FIELDS) : null;

  const onSubmit = form.handleSubmit(async (input) => {
    try {
      const saved = await update.mutateAsync({
        id: ret.id,
        patch: {
          rmaNumber: input.rmaNumber.trim(),
          notes: input.notes.trim(),
          costs: costsFromForm(input.costs),
        },
      });
      form.reset({
        rmaNumber: saved.rmaNumber ?? '',
        notes: saved.notes ?? '',
        costs: costsToForm(saved.costs),
      });
      toasts.success(`Return ${saved.number} is saved.`);
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      if (fieldErrors.rmaNumber)
        form.setError('rmaNumber', { type: 'server', message: fieldErrors.rmaNumber });
      if (fieldErrors.notes) form.setError('notes', { type: 'server', message: fieldErrors.notes });
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Edit return">
      <Stack spacing={2}>
        {serverErrors && serverErrors.formErrors.length > 0 && (
          <Alert severity="error">{serverErrors.formErrors.join(' ')}</Alert>
        )}
        <TextField
          label="Supplier RMA number"
          error={!!errors.rmaNumber}
          helperText={errors.rmaNumber?.message}
          {...form.register('rmaNumber')}
        />
        <TextField
          label="Notes"
          multiline
          minRows={2}
          error={!!errors.notes}
          helperText={errors.notes?.message}
          {...form.register('notes')}
        />
        <CostFields
          costs={costs}
          register={(name) => form.register(`costs.${name}`)}
          errors={errors.costs}
        />
        <div>
          <Button type="submit" variant="outlined" disabled={!isDirty} loading={isSubmitting}>
            Save changes
          </Button>
        </div>
      </Stack>
    </form>
  );
}
