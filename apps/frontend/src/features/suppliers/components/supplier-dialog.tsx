import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Dialog, DialogActions, DialogContent, DialogTitle, MenuItem } from '@mui/material';
import { useForm } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { createOrUpdate, useVersionedEdit } from '@/components/form/use-versioned-edit';
import {
  supplierSchema,
  toSupplierBody,
  useCreateSupplier,
  type SupplierInput,
} from '@/features/suppliers/api/create-supplier';
import { supplierPatch, useUpdateSupplier } from '@/features/suppliers/api/update-supplier';
import { SUPPLIER_STATUSES, supplierStatusLabels, type Supplier } from '@/features/suppliers/types';
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
  const { control } = form;

  const edit = useVersionedEdit({
    form,
    fields: FIELDS,
    record: supplier,
    toInput,
    mutation,
    what: 'this supplier',
    save: async (input, base, version) => {
      const saved = await createOrUpdate(base, version, toSupplierBody(input), {
        create: create.mutateAsync,
        update: update.mutateAsync,
        patch: (body, from) => supplierPatch(from, body),
      });
      toasts.success(supplier ? `${saved.name} saved.` : `${saved.name} added.`);
      onClose();
    },
  });

  const title = supplier ? `Edit ${supplier.name}` : 'New supplier';
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={edit.onSubmit} aria-label={title}>
        <DialogTitle>{title}</DialogTitle>
        <DialogContent>
          {edit.alerts}
          <FormTextField control={control} name="name" label="Name" />
          <FormTextField
            control={control}
            name="code"
            label="Code"
            helperText="Short and unique; shown in lot lists."
          />
          <FormTextField
            control={control}
            name="contactEmail"
            label="Contact e-mail"
            type="email"
            helperText="Where returns and SCARs are sent."
          />
          <FormTextField
            control={control}
            name="status"
            label="Status"
            select
            helperText="A suspended supplier’s deliveries can still be received, with a warning."
          >
            {SUPPLIER_STATUSES.map((status) => (
              <MenuItem key={status} value={status}>
                {supplierStatusLabels[status]}
              </MenuItem>
            ))}
          </FormTextField>
          <FormTextField control={control} name="notes" label="Notes" multiline minRows={2} />
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={form.formState.isSubmitting}>
            {supplier ? 'Save' : 'Add supplier'}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
