import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Stack,
  TextField,
} from '@mui/material';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { useNavigate } from 'react-router';
import { paths } from '@/config/paths';
import {
  createCorrectiveActionSchema,
  useCreateCorrectiveAction,
  type CreateCorrectiveActionInput,
} from '@/features/corrective-actions/api/create-corrective-action';
import { SupplierLotsPicker } from '@/features/corrective-actions/components/supplier-lots-picker';
import { SupplierSelect } from '@/components/supplier-select/supplier-select';
import { todayIso } from '@/lib/dates';
import { splitServerErrors } from '@/lib/server-field-errors';
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
  const { errors, isSubmitting } = form.formState;
  const supplierId = useWatch({ control: form.control, name: 'supplierId' });
  const formErrors = create.isError ? splitServerErrors(create.error, FIELDS).formErrors : [];

  const onSubmit = form.handleSubmit(async (input) => {
    try {
      const created = await create.mutateAsync(input);
      toasts.success(`${created.number} is open; the response is due ${created.dueOn}.`);
      onClose();
      void navigate(paths.correctiveActionDetail.getHref(created.id));
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const f of FIELDS) {
        const message = fieldErrors[f];
        if (message) form.setError(f, { type: 'server', message });
      }
    }
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md">
      <form noValidate onSubmit={onSubmit} aria-label="New corrective action request">
        <DialogTitle>New corrective action request (SCAR)</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
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
            <TextField
              label="Problem"
              required
              multiline
              minRows={3}
              error={!!errors.problem}
              helperText={
                errors.problem?.message ??
                'What was found, on which lots, and what the supplier must answer.'
              }
              {...form.register('problem')}
            />
            <TextField
              label="Response due on"
              type="date"
              required
              slotProps={{ inputLabel: { shrink: true }, htmlInput: { min: todayIso() } }}
              error={!!errors.dueOn}
              helperText={errors.dueOn?.message ?? ' '}
              sx={{ maxWidth: 240 }}
              {...form.register('dueOn')}
            />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            Raise the request
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
