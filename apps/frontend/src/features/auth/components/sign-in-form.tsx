import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Button, Stack } from '@mui/material';
import { useForm } from 'react-hook-form';
import { FormTextField } from '@/components/form/form-text-field';
import { loginSchema, useLogin, type LoginInput } from '@/features/auth/api/login';
import type { SessionUser } from '@/features/auth/types';
import { isApiError } from '@/lib/api-client';

/** What to tell the user when signing in fails. Never says which field was wrong. */
export function signInErrorMessage(error: unknown): string {
  if (isApiError(error) && (error.status === 401 || error.status === 429)) return error.message;
  if (isApiError(error) && error.status === 400) return 'Check the e-mail address and password.';
  return 'Signing in is not possible right now. Try again in a moment.';
}

export function SignInForm({ onSignedIn }: { onSignedIn?: (user: SessionUser) => void }) {
  const login = useLogin();
  const { control, handleSubmit } = useForm<LoginInput>({
    resolver: zodResolver(loginSchema),
    mode: 'onTouched',
    defaultValues: { email: '', password: '' },
  });

  const onSubmit = handleSubmit((input) =>
    login.mutate(input, { onSuccess: ({ user }) => onSignedIn?.(user) }),
  );

  return (
    <Stack component="form" noValidate onSubmit={onSubmit} aria-label="Sign in">
      {login.isError && (
        <Alert severity="error" sx={{ mb: 1 }}>
          {signInErrorMessage(login.error)}
        </Alert>
      )}
      <FormTextField
        control={control}
        name="email"
        label="E-mail"
        type="email"
        autoComplete="username"
        autoFocus
      />
      <FormTextField
        control={control}
        name="password"
        label="Password"
        type="password"
        autoComplete="current-password"
      />
      <Button
        type="submit"
        variant="contained"
        size="large"
        sx={{ mt: 2 }}
        loading={login.isPending}
      >
        Sign in
      </Button>
    </Stack>
  );
}
