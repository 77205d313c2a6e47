import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Dialog, DialogActions, DialogContent, DialogTitle, Stack } from '@mui/material';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { useNavigate } from 'react-router';
import { FormTextField } from '@/components/form/form-text-field';
import { ServerErrorAlert, submitWithServerErrors } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { emptyCosts } from '@/features/returns/api/cost-schema';
import {
  createReturnSchema,
  useCreateReturn,
  type CreateReturnForm,
} from '@/features/returns/api/create-return';
import { COST_PATHS, CostFields } from '@/features/returns/components/cost-fields';
import { ReturnableLotsPicker } from '@/features/returns/components/returnable-lots-picker';
import { SupplierSelect } from '@/components/supplier-select/supplier-select';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['lotIds', 'rmaNumber', 'notes', ...COST_PATHS] as const;

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
  const costs = useWatch({ control: form.control, name: 'costs' });
  const supplierId = useWatch({ control: form.control, name: 'supplierId' });

  const onSubmit = submitWithServerErrors(form, FIELDS, async (input) => {
    const created = await create.mutateAsync(input);
    toasts.success(`Return ${created.number} is raised as a draft.`);
    onClose();
    void navigate(paths.returnDetail.getHref(created.id));
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md">
      <form noValidate onSubmit={onSubmit} aria-label="New return">
        <DialogTitle>New return to vendor</DialogTitle>
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
            <FormTextField
              control={form.control}
              name="rmaNumber"
              label="Supplier RMA number (optional)"
            />
            <FormTextField
              control={form.control}
              name="notes"
              label="Notes (optional)"
              multiline
              minRows={2}
            />
            <CostFields control={form.control} costs={costs} />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={form.formState.isSubmitting}>
            Raise the return
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
