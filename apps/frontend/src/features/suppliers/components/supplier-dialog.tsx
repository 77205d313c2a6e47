import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  MenuItem,
  TextField,
} from '@mui/material';
import { Controller, useForm } from 'react-hook-form';
import {
  supplierSchema,
  toSupplierBody,
  useCreateSupplier,
  type SupplierInput,
} from '@/features/suppliers/api/create-supplier';
import { supplierPatch, useUpdateSupplier } from '@/features/suppliers/api/update-supplier';
import { SUPPLIER_STATUSES, supplierStatusLabels, type Supplier } from '@/features/suppliers/types';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['name', 'code', 'contactEmail', 'status', 'notes'] as const;
const EMPTY: SupplierInput = {
  name: '',
  code: '',
  contactEmail: '',
  status: 'approved',
  notes: '',
};

const toInput = (s: Supplier): SupplierInput => ({
  name: s.name,
  code: s.code,
  contactEmail: s.contactEmail ?? '',
  status: s.status,
  notes: s.notes ?? '',
});

interface SupplierDialogProps {
  /** null: a new supplier. */
  supplier: Supplier | null;
  onClose: () => void;
}

/** Create or edit a supplier; opened only for purchasing and admin (the server decides). */
export function SupplierDialog({ supplier, onClose }: SupplierDialogProps) {
  const create = useCreateSupplier();
  const update = useUpdateSupplier();
  const mutation = supplier ? update : create;
  const form = useForm<SupplierInput>({
    resolver: zodResolver(supplierSchema),
    mode: 'onChange',
    defaultValues: supplier ? toInput(supplier) : EMPTY,
  });
  const { errors, isSubmitting } = form.formState;
  const formErrors = mutation.isError ? splitServerErrors(mutation.error, FIELDS).formErrors : [];

  const onSubmit = form.handleSubmit(async (input) => {
    const body = toSupplierBody(input);
    try {
      const saved = supplier
        ? await update.mutateAsync({ id: supplier.id, patch: supplierPatch(supplier, body) })
        : await create.mutateAsync(body);
      toasts.success(supplier ? `${saved.name} saved.` : `${saved.name} added.`);
      onClose();
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const field of FIELDS) {
        const message = fieldErrors[field];
        if (message) form.setError(field, { type: 'server', message });
      }
    }
  });

  const title = supplier ? `Edit ${supplier.name}` : 'New supplier';
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label={title}>
        <DialogTitle>{title}</DialogTitle>
        <DialogContent>
          {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
          <TextField
            label="Name"
            error={!!errors.name}
            helperText={errors.name?.message}
            {...form.register('name')}
          />
          <TextField
            label="Code"
            error={!!errors.code}
            helperText={errors.code?.message ?? 'Short and unique; shown in lot lists.'}
            {...form.register('code')}
          />
          <TextField
            label="Contact e-mail"
            type="email"
            error={!!errors.contactEmail}
            helperText={errors.contactEmail?.message ?? 'Where returns and SCARs are sent.'}
            {...form.register('contactEmail')}
          />
          <Controller
            control={form.control}
            name="status"
            render={({ field, fieldState }) => (
              <TextField
                select
                label="Status"
                {...field}
                error={!!fieldState.error}
                helperText={
                  fieldState.error?.message ??
                  'A suspended supplier’s deliveries can still be received, with a warning.'
                }
              >
                {SUPPLIER_STATUSES.map((status) => (
                  <MenuItem key={status} value={status}>
                    {supplierStatusLabels[status]}
                  </MenuItem>
                ))}
              </TextField>
            )}
          />
          <TextField
            label="Notes"
            multiline
            minRows={2}
            error={!!errors.notes}
            helperText={errors.notes?.message}
            {...form.register('notes')}
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            {supplier ? 'Save' : 'Add supplier'}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
