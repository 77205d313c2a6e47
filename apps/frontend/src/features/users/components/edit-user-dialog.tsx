import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  TextField,
} from '@mui/material';
import { useForm } from 'react-hook-form';
import {
  editToPatch,
  editUserSchema,
  useUpdateUser,
  type EditUserInput,
} from '@/features/users/api/update-user';
import { RoleField } from '@/features/users/components/role-options';
import type { User } from '@/features/users/types';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['name', 'role', 'password'] as const;

export function EditUserDialog({ user, onClose }: { user: User; onClose: () => void }) {
  const update = useUpdateUser({ inlineErrors: true });
  const form = useForm<EditUserInput>({
    resolver: zodResolver(editUserSchema),
    mode: 'onChange',
    defaultValues: { name: user.name, role: user.role, password: '' },
  });
  const { errors, isSubmitting } = form.formState;
  const formErrors = update.isError ? splitServerErrors(update.error, FIELDS).formErrors : [];

  const onSubmit = form.handleSubmit(async (input) => {
    const patch = editToPatch(user, input);
    if (Object.keys(patch).length === 0) return onClose();
    try {
      await update.mutateAsync({ id: user.id, patch });
      toasts.success(`Saved changes to ${user.name}.`);
      onClose();
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const field of FIELDS) {
        const message = fieldErrors[field];
        if (message) form.setError(field, { type: 'server', message });
      }
    }
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label="Edit user">
        <DialogTitle>Edit {user.email}</DialogTitle>
        <DialogContent>
          {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
          <TextField
            label="Name"
            error={!!errors.name}
            helperText={errors.name?.message}
            {...form.register('name')}
          />
          <RoleField control={form.control} />
          <TextField
            label="New password"
            type="password"
            autoComplete="new-password"
            error={!!errors.password}
            helperText={errors.password?.message ?? 'Leave empty to keep the current password.'}
            {...form.register('password')}
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            Save
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
