import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useForm } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { useVersionedEdit } from '@/components/form/use-versioned-edit';
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
const toInput = (u: User): EditUserInput => ({ name: u.name, role: u.role, password: '' });

export function EditUserDialog({ user, onClose }: { user: User; onClose: () => void }) {
  const update = useUpdateUser({ inlineErrors: true });
  const form = useForm<EditUserInput>({
    resolver: zodResolver(editUserSchema),
    mode: 'onChange',
    defaultValues: toInput(user),
  });
  const { control } = form;

  const edit = useVersionedEdit({
    form,
    fields: FIELDS,
    record: user,
    toInput,
    mutation: update,
    what: 'this account',
    save: async (input, base, version) => {
      const account = base ?? user;
      const patch = editToPatch(account, input);
      if (Object.keys(patch).length === 0) return onClose();
      await update.mutateAsync({ id: account.id, version: version ?? account.version, patch });
      toasts.success(`Saved changes to ${input.name}.`);
      onClose();
    },
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={edit.onSubmit} aria-label="Edit user">
        <DialogTitle>Edit {user.email}</DialogTitle>
        <DialogContent>
          {edit.alerts}
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
