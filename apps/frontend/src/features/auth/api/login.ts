import type { LoginAnswer } from '@gaugeproof/api-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { forgetOfflineAnswers } from '@/lib/offline-answers';
import { queryKeys } from '@/lib/query-keys';

export const loginSchema = z.object({
  email: z
    .string()
    .trim()
    .min(1, 'Enter your e-mail address.')
    .pipe(z.email('Enter a valid e-mail address.')),
  password: z.string().min(1, 'Enter your password.'),
});
export type LoginInput = z.infer<typeof loginSchema>;

export type LoginResponse = LoginAnswer;

export const login = (input: LoginInput) => api.post<LoginResponse>('/auth/login', input);

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: ['auth', 'login'],
    mutationFn: login,
    // A 401 here means wrong credentials; the form shows it.
    meta: { ignoreUnauthorized: true, inlineErrors: true },
    onSuccess: ({ user }) => {
      // Nothing cached for a previous user may leak into this session. (Not clear():
      // that would also drop the session query the auth context is watching.)
      queryClient.removeQueries({
        predicate: (query) => query.queryKey[0] !== queryKeys.auth.all[0],
      });
      queryClient.setQueryData(queryKeys.auth.me(), user);
      void forgetOfflineAnswers();
    },
  });
}
