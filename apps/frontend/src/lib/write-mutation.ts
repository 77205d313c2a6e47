import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';

export interface WriteOptions {
  /** The data the write changes (`queryKeys.<resource>.all`), refreshed in this order. */
  refresh: readonly QueryKey[];
  /**
   * Refresh after a refusal too: a 409 means the screen shows an old copy, so load it
   * again either way. Otherwise only after the write succeeded.
   */
  refreshOnError?: boolean;
  /** The screen shows the error itself (a form with field messages): no toast. */
  inlineErrors?: boolean;
}

/**
 * The one shape of a write: send it (`mutationFn`, JSON through `api` or an upload), let the
 * form map a refusal onto its fields (`inlineErrors`, `submitWithServerErrors`) and refresh
 * what it changed. The mutation resolves once the refreshed data is asked for, as before.
 */
export function useWriteMutation<TData, TVariables = void>(
  mutationFn: (variables: TVariables) => Promise<TData>,
  { refresh, refreshOnError = false, inlineErrors = true }: WriteOptions,
) {
  const queryClient = useQueryClient();
  const refreshAll = async () => {
    for (const queryKey of refresh) await queryClient.invalidateQueries({ queryKey });
  };
  return useMutation({
    mutationFn,
    meta: { inlineErrors },
    onSuccess: refreshOnError ? undefined : refreshAll,
    onSettled: refreshOnError ? refreshAll : undefined,
  });
}
