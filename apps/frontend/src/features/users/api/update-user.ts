import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { ROLES, type Role } from '@/lib/roles';
import { PASSWORD_MIN_LENGTH } from '@/features/users/api/create-user';
import type { User } from '@/features/users/types';
import { queryKeys } from '@/lib/query-keys';

/** The edit form: an empty password means "leave it as it is". */
export const editUserSchema = z.object({
  name: z.string().trim().min(1, 'Enter the person’s name.').max(120, 'At most 120 characters.'),
  role: z.enum(ROLES, 'Choose a role.'),
  password: z.string().refine((value) => value === '' || value.length >= PASSWORD_MIN_LENGTH, {
    message: `At least ${PASSWORD_MIN_LENGTH} characters, or leave empty.`,
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
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    meta: { inlineErrors },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.users.all }),
  });
}
