import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { User } from '@/features/users/types';
import { queryKeys } from '@/lib/query-keys';

export const getUsers = (signal?: AbortSignal) => api.get<User[]>('/users', signal);

export const usersQueryOptions = () =>
  queryOptions({ queryKey: queryKeys.users.lists(), queryFn: ({ signal }) => getUsers(signal) });

export const useUsers = () => useQuery(usersQueryOptions());
