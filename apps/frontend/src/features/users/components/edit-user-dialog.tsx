import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useForm } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { ServerErrorAlert, submitWithServerErrors } from '@/components/form/server-errors';
import {
  editToPatch,
  editUserSchema,
  useUpdateUser,
  type EditUserInput,
} from '@/features/users/api/update-user';
import { roleOptions } from '@/features/users/components/role-options';
import type { User } from '@/features/users/types';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['name', 'role', 'password'] as const;

export function EditUserDialog({ user, onClose }: { user: User; onClose: () => void }) {
  const update = useUpdateUser({ inlineErrors: true });
  const form = useForm<EditUserInput>({
    resolver: zodResolver(editUserSchema),
    mode: 'onChange',
    defaultValues: { name: user.name, role: user.role, password: '' },
  });
  const { control } = form;

  const onSubmit = submitWithServerErrors(form, FIELDS, async (input) => {
    const patch = editToPatch(user, input);
    if (Object.keys(patch).length === 0) return onClose();
    await update.mutateAsync({ id: user.id, patch });
    toasts.success(`Saved changes to ${user.name}.`);
    onClose();
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label="Edit user">
        <DialogTitle>Edit {user.email}</DialogTitle>
        <DialogContent>
          <ServerErrorAlert error={update.error} fields={FIELDS} />
          <FormTextField control={control} name="name" label="Name" />
          <FormTextField control={control} name="role" label="Role" select>
            {roleOptions}
          </FormTextField>
          <FormTextField
            control={control}
            name="password"
            label="New password"
            type="password"
            autoComplete="new-password"
            helperText="Leave empty to keep the current password."
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={form.formState.isSubmitting}>
            Save
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
