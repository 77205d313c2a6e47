import { NOTICE_SWITCHES, type NoticeSettings, type NoticeSwitch } from '@gaugeproof/api-types';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

// The switches are the contract's (libs/api-types).
export { NOTICE_SWITCHES, type NoticeSwitch };
export type NoticeChoices = Record<NoticeSwitch, boolean> & { digest: boolean };

/** GET /api/me/notices: the user's choices and the notices their role is offered. */
export type MyNotices = NoticeSettings;

export const myNoticesQueryOptions = () =>
  queryOptions({
    queryKey: queryKeys.notices.mine(),
    queryFn: ({ signal }) => api.get<MyNotices>('/me/notices', signal),
  });

export const useMyNotices = () => useQuery(myNoticesQueryOptions());

/** Changes switches; each change is saved at once (the page has no save button). */
export function useUpdateNotices() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (change: Partial<NoticeChoices>) => api.patch<MyNotices>('/me/notices', change),
    meta: { inlineErrors: true },
    onSuccess: (data) => client.setQueryData(queryKeys.notices.mine(), data),
  });
}
