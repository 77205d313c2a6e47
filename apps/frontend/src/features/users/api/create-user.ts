import { z } from 'zod';
import { PASSWORD } from '@gaugeproof/api-types';
import { api } from '@/lib/api-client';
import { ROLES } from '@/lib/roles';
import type { User } from '@/features/users/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { maxChars, passwordProblem } from '@/lib/contract-rules';

/** The contract's password rule (PASSWORD): at least 10 characters once trimmed, at most 72 bytes. */
export const PASSWORD_MIN_LENGTH = PASSWORD.minLength;

/** The fields an account's create and edit forms share. */
export const accountFields = {
  name: z
    .string()
    .trim()
    .min(1, 'Enter the person’s name.')
    .max(...maxChars('name')),
  role: z.enum(ROLES, 'Choose a role.'),
};

export const createUserSchema = z.object({
  email: z
    .string()
    .trim()
    .max(...maxChars('email'))
    .pipe(z.email('Enter a valid e-mail address.')),
  ...accountFields,
  password: z.string().superRefine((value, ctx) => {
    const problem = passwordProblem(value);
    if (problem) ctx.addIssue({ code: 'custom', message: problem });
  }),
});
export type CreateUserInput = z.infer<typeof createUserSchema>;

export const createUser = (input: CreateUserInput) => api.post<User>('/users', input);

export function useCreateUser() {
  return useWriteMutation(createUser, {
    refresh: [queryKeys.users.all],
  });
}
