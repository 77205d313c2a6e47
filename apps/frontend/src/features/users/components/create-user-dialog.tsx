import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Dialog, DialogActions, DialogContent, DialogTitle } from '@mui/material';
import { useForm } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { ServerErrorAlert, submitWithServerErrors } from '@/components/form/server-errors';
import {
  createUserSchema,
  PASSWORD_MIN_LENGTH,
  useCreateUser,
  type CreateUserInput,
} from '@/features/users/api/create-user';
import { roleOptions } from '@/features/users/components/role-options';
import { toasts } from '@/lib/toast-store';

const FIELDS = ['email', 'name', 'role', 'password'] as const;
const EMPTY: CreateUserInput = { email: '', name: '', role: 'clerk', password: '' };

export function CreateUserDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const create = useCreateUser();
  const form = useForm<CreateUserInput>({
    resolver: zodResolver(createUserSchema),
    mode: 'onChange',
    defaultValues: EMPTY,
  });
  const { control } = form;

  const close = () => {
    form.reset(EMPTY);
    create.reset();
    onClose();
  };

  const onSubmit = submitWithServerErrors(form, FIELDS, async (input) => {
    const user = await create.mutateAsync(input);
    toasts.success(`${user.name} can now sign in.`);
    close();
  });

  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label="New user">
        <DialogTitle>New user</DialogTitle>
        <DialogContent>
          <ServerErrorAlert error={create.error} fields={FIELDS} />
          <FormTextField control={control} name="email" label="E-mail" type="email" />
          <FormTextField control={control} name="name" label="Name" />
          <FormTextField control={control} name="role" label="Role" select>
            {roleOptions}
          </FormTextField>
          <FormTextField
            control={control}
            name="password"
            label="Password"
            type="password"
            autoComplete="new-password"
            helperText={`At least ${PASSWORD_MIN_LENGTH} characters. Share it with the person in private.`}
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" variant="contained" loading={form.formState.isSubmitting}>
            Create user
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
