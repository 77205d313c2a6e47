import { z } from 'zod';
import { api } from '@/lib/api-client';
import { accountFields } from '@/features/users/api/create-user';
import type { Role } from '@/lib/roles';
import type { User } from '@/features/users/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { passwordProblem } from '@/lib/contract-rules';

/** The edit form: an empty password means "leave it as it is". */
export const editUserSchema = z.object({
  ...accountFields,
  password: z.string().superRefine((value, ctx) => {
    const problem = value === '' ? null : passwordProblem(value);
    if (problem)
      ctx.addIssue({ code: 'custom', message: `${problem.slice(0, -1)}, or leave empty.` });
  }),
});
export type EditUserInput = z.infer<typeof editUserSchema>;

export interface UserPatch {
  name?: string;
  role?: Role;
  active?: boolean;
  password?: string;
}

/** An edit of the account as loaded at `version`; a stale version is answered 409. */
export const updateUser = ({
  id,
  version,
  patch,
}: {
  id: number;
  version: number;
  patch: UserPatch;
}) => api.patch<User>(`/users/${id}`, { version, ...patch });

/** Turns the edit form into a patch that sends only what changed. */
export function editToPatch(user: User, input: EditUserInput): UserPatch {
  const patch: UserPatch = {};
  if (input.name !== user.name) patch.name = input.name;
  if (input.role !== user.role) patch.role = input.role;
  if (input.password !== '') patch.password = input.password;
  return patch;
}

export function useUpdateUser({ inlineErrors = false } = {}) {
  return useWriteMutation(updateUser, {
    refresh: [queryKeys.users.all],
    inlineErrors,
  });
}
