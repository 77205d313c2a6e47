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
import { emptyCosts } from '@/features/returns/api/cost-schema';
import {
  createReturnSchema,
  useCreateReturn,
  type CreateReturnForm,
} from '@/features/returns/api/create-return';
import { CostFields } from '@/features/returns/components/cost-fields';
import { ReturnableLotsPicker } from '@/features/returns/components/returnable-lots-picker';
import { SupplierSelect } from '@/components/supplier-select/supplier-select';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['lotIds', 'rmaNumber', 'notes', 'costs'] as const;

interface NewReturnDialogProps {
  onClose: () => void;
  /** Preselected from the Lot page's "Raise return". */
  initial?: { supplierId: number; lotId: number };
}

export function NewReturnDialog({ onClose, initial }: NewReturnDialogProps) {
  const navigate = useNavigate();
  const create = useCreateReturn();
  const form = useForm<CreateReturnForm>({
    resolver: zodResolver(createReturnSchema),
    mode: 'onChange',
    defaultValues: {
      supplierId: initial?.supplierId ?? 0,
      lotIds: initial ? [initial.lotId] : [],
      rmaNumber: '',
      notes: '',
      costs: emptyCosts,
    },
  });
  const { errors, isSubmitting } = form.formState;
  const costs = useWatch({ control: form.control, name: 'costs' });
  const supplierId = useWatch({ control: form.control, name: 'supplierId' });
  const serverErrors = create.isError ? splitServerErrors(create.error, FIELDS) : null;

  const onSubmit = form.handleSubmit(async (input) => {
    try {
      const created = await create.mutateAsync(input);
      toasts.success(`Return ${created.number} is raised as a draft.`);
      onClose();
      void navigate(paths.returnDetail.getHref(created.id));
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      if (fieldErrors.rmaNumber)
        form.setError('rmaNumber', { type: 'server', message: fieldErrors.rmaNumber });
      if (fieldErrors.notes) form.setError('notes', { type: 'server', message: fieldErrors.notes });
      if (fieldErrors.lotIds)
        form.setError('lotIds', { type: 'server', message: fieldErrors.lotIds });
    }
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md">
      <form noValidate onSubmit={onSubmit} aria-label="New return">
        <DialogTitle>New return to vendor</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            {serverErrors && serverErrors.formErrors.length > 0 && (
              <Alert severity="error">{serverErrors.formErrors.join(' ')}</Alert>
            )}
            <Controller
              control={form.control}
              name="supplierId"
              render={({ field, fieldState }) => (
                <SupplierSelect
                  required
                  value={field.value || null}
                  onChange={(id) => {
                    field.onChange(id ?? 0);
                    form.setValue('lotIds', [], { shouldValidate: form.formState.isSubmitted });
                  }}
                  error={fieldState.error?.message}
                />
              )}
            />
            <Controller
              control={form.control}
              name="lotIds"
              render={({ field, fieldState }) => (
                <ReturnableLotsPicker
                  supplierId={supplierId || null}
                  value={field.value}
                  onChange={field.onChange}
                  error={fieldState.error?.message}
                />
              )}
            />
            <TextField
              label="Supplier RMA number (optional)"
              error={!!errors.rmaNumber}
              helperText={errors.rmaNumber?.message}
              {...form.register('rmaNumber')}
            />
            <TextField
              label="Notes (optional)"
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
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            Raise the return
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
