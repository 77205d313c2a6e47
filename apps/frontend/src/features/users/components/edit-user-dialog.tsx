import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StaleEditAlert, staleCurrent } from '@/components/stale-edit-alert';
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

  // The copy the edit is made on: its fields tell what the admin changed, its version goes along.
  const [loaded, setLoaded] = useState(user);
  // The account as another admin saved it after this form was opened (a 409), until resolved.
  const [theirs, setTheirs] = useState<User | null>(null);

  const save = (version?: number) =>
    submitWithServerErrors(form, FIELDS, async (input) => {
      const patch = editToPatch(loaded, input);
      if (Object.keys(patch).length === 0) return onClose();
      try {
        await update.mutateAsync({ id: loaded.id, version: version ?? loaded.version, patch });
      } catch (error) {
        const current = staleCurrent<User>(error);
        if (!current) throw error;
        setTheirs(current);
        return;
      }
      toasts.success(`Saved changes to ${input.name}.`);
      onClose();
    });
  const onSubmit = save();
  const onSaveMine = () => {
    const version = theirs?.version;
    setTheirs(null);
    void save(version)();
  };
  const onLoadTheirs = () => {
    if (!theirs) return;
    form.reset({ name: theirs.name, role: theirs.role, password: '' });
    setLoaded(theirs);
    setTheirs(null);
    update.reset();
  };

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label="Edit user">
        <DialogTitle>Edit {user.email}</DialogTitle>
        <DialogContent>
          {theirs && (
            <StaleEditAlert
              what="this account"
              onLoadTheirs={onLoadTheirs}
              onSaveMine={onSaveMine}
              saving={form.formState.isSubmitting}
            />
          )}
          <ServerErrorAlert error={theirs ? null : update.error} fields={FIELDS} />
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
