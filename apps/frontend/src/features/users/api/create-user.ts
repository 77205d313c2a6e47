import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { ROLES } from '@/lib/roles';
import type { User } from '@/features/users/types';
import { queryKeys } from '@/lib/query-keys';

export const PASSWORD_MIN_LENGTH = 10;

export const createUserSchema = z.object({
  email: z.string().trim().pipe(z.email('Enter a valid e-mail address.')),
  name: z.string().trim().min(1, 'Enter the person’s name.').max(120, 'At most 120 characters.'),
  role: z.enum(ROLES, 'Choose a role.'),
  password: z
    .string()
    .min(PASSWORD_MIN_LENGTH, `At least ${PASSWORD_MIN_LENGTH} characters.`)
    .max(200, 'At most 200 characters.'),
});
export type CreateUserInput = z.infer<typeof createUserSchema>;

export const createUser = (input: CreateUserInput) => api.post<User>('/users', input);

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    meta: { inlineErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.users.all }),
  });
}
