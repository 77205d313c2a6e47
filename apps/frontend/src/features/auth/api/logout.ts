import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { forgetOfflineAnswers } from '@/lib/offline-answers';
import { queryKeys } from '@/lib/query-keys';

export const logout = () => api.post<void>('/auth/logout');

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: ['auth', 'logout'],
    mutationFn: logout,
    meta: { ignoreUnauthorized: true },
    // Signed out either way: an already-ended session is still signed out.
    onSettled: async () => {
      queryClient.removeQueries({
        predicate: (query) => query.queryKey[0] !== queryKeys.auth.all[0],
      });
      queryClient.setQueryData(queryKeys.auth.me(), null);
      await forgetOfflineAnswers();
    },
  });
}
