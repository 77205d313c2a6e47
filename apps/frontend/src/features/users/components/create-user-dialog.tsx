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
  createUserSchema,
  useCreateUser,
  type CreateUserInput,
} from '@/features/users/api/create-user';
import { RoleField } from '@/features/users/components/role-options';
import { splitServerErrors } from '@/lib/server-field-errors';
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
  const { errors, isSubmitting } = form.formState;
  const formErrors = create.isError ? splitServerErrors(create.error, FIELDS).formErrors : [];

  const close = () => {
    form.reset(EMPTY);
    create.reset();
    onClose();
  };

  const onSubmit = form.handleSubmit(async (input) => {
    try {
      const user = await create.mutateAsync(input);
      toasts.success(`${user.name} can now sign in.`);
      close();
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const field of FIELDS) {
        const message = fieldErrors[field];
        if (message) form.setError(field, { type: 'server', message });
      }
    }
  });

  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="sm">
      <form noValidate onSubmit={onSubmit} aria-label="New user">
        <DialogTitle>New user</DialogTitle>
        <DialogContent>
          {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
          <TextField
            label="E-mail"
            type="email"
            error={!!errors.email}
            helperText={errors.email?.message}
            {...form.register('email')}
          />
          <TextField
            label="Name"
            error={!!errors.name}
            helperText={errors.name?.message}
            {...form.register('name')}
          />
          <RoleField control={form.control} />
          <TextField
            label="Password"
            type="password"
            autoComplete="new-password"
            error={!!errors.password}
            helperText={
              errors.password?.message ??
              'At least 10 characters. Share it with the person in private.'
            }
            {...form.register('password')}
          />
        </DialogContent>
        <DialogActions>
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            Create user
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
