import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';
import type { SessionUser } from '@/features/auth/types';
import { queryKeys } from '@/lib/query-keys';

/** The signed-in user, or null when there is no valid session (a 401 is an answer here). */
export async function getMe(signal?: AbortSignal): Promise<SessionUser | null> {
  try {
    return await api.get<SessionUser>('/auth/me', signal);
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: queryKeys.auth.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });

export const useMe = () => useQuery(meQueryOptions());
