import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { User } from '@/features/users/types';

export const usersKeys = {
  all: ['users'] as const,
  list: () => [...usersKeys.all, 'list'] as const,
};

export const getUsers = (signal?: AbortSignal) => api.get<User[]>('/users', signal);

export const usersQueryOptions = () =>
  queryOptions({ queryKey: usersKeys.list(), queryFn: ({ signal }) => getUsers(signal) });

export const useUsers = () => useQuery(usersQueryOptions());
