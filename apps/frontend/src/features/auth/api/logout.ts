import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { meQueryKey } from '@/features/auth/api/get-me';

export const logout = () => api.post<void>('/auth/logout');

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: ['auth', 'logout'],
    mutationFn: logout,
    meta: { ignoreUnauthorized: true },
    // Signed out either way: an already-ended session is still signed out.
    onSettled: () => {
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== 'auth' });
      queryClient.setQueryData(meQueryKey, null);
    },
  });
}
