import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Dialog, DialogActions, DialogContent, DialogTitle, Stack } from '@mui/material';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { useNavigate } from 'react-router';
import { FormTextField } from '@/components/form/form-text-field';
import { ServerErrorAlert, submitWithServerErrors } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import {
  createCorrectiveActionSchema,
  useCreateCorrectiveAction,
  type CreateCorrectiveActionInput,
} from '@/features/corrective-actions/api/create-corrective-action';
import { SupplierLotsPicker } from '@/features/corrective-actions/components/supplier-lots-picker';
import { SupplierSelect } from '@/components/supplier-select/supplier-select';
import { todayIso } from '@/lib/dates';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['supplierId', 'lotIds', 'problem', 'dueOn'] as const;

export function NewCorrectiveActionDialog({ onClose }: { onClose: () => void }) {
  const navigate = useNavigate();
  const create = useCreateCorrectiveAction();
  const form = useForm<CreateCorrectiveActionInput>({
    resolver: zodResolver(createCorrectiveActionSchema),
    mode: 'onChange',
    defaultValues: { supplierId: 0, lotIds: [], problem: '', dueOn: '' },
  });
  const supplierId = useWatch({ control: form.control, name: 'supplierId' });

  const onSubmit = submitWithServerErrors(form, FIELDS, async (input) => {
    const created = await create.mutateAsync(input);
    toasts.success(`${created.number} is open; the response is due ${created.dueOn}.`);
    onClose();
    void navigate(paths.correctiveActionDetail.getHref(created.id));
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md">
      <form noValidate onSubmit={onSubmit} aria-label="New corrective action request">
        <DialogTitle>New corrective action request (SCAR)</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            <ServerErrorAlert error={create.error} fields={FIELDS} />
            <Controller
              control={form.control}
              name="supplierId"
              render={({ field, fieldState }) => (
                <SupplierSelect
                  required
                  value={field.value || null}
                  onChange={(id) => {
                    field.onChange(id ?? 0);
                    form.setValue('lotIds', []);
                  }}
                  error={fieldState.error?.message}
                />
              )}
            />
            <Controller
              control={form.control}
              name="lotIds"
              render={({ field, fieldState }) => (
                <SupplierLotsPicker
                  supplierId={supplierId || null}
                  value={field.value}
                  onChange={field.onChange}
                  error={fieldState.error?.message}
                />
              )}
            />
            <FormTextField
              control={form.control}
              name="problem"
              label="Problem"
              required
              multiline
              minRows={3}
              helperText="What was found, on which lots, and what the supplier must answer."
            />
            <FormTextField
              control={form.control}
              name="dueOn"
              label="Response due on"
              type="date"
              required
              slotProps={{ inputLabel: { shrink: true }, htmlInput: { min: todayIso() } }}
              helperText=" "
              sx={{ maxWidth: 240 }}
            />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={form.formState.isSubmitting}>
            Raise the request
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
