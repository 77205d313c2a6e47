import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from '@/lib/api-client';
import { toasts } from '@/lib/toast-store';

/** Per-query and per-mutation switches read by the error hooks below. */
export interface RequestMeta extends Record<string, unknown> {
  /** A 401 here means "wrong credentials", not "session ended" (the login call). */
  ignoreUnauthorized?: boolean;
  /** The screen shows this error itself (forms with field messages); no toast. */
  inlineErrors?: boolean;
  /** Toast a query's error even on first load (most lists show it inline instead). */
  toastErrors?: boolean;
}

declare module '@tanstack/react-query' {
  interface Register {
    queryMeta: RequestMeta;
    mutationMeta: RequestMeta;
  }
}

export function errorMessage(error: unknown): string {
  if (isApiError(error)) return error.message;
  if (error instanceof TypeError) return 'The server cannot be reached. Check the connection.';
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}

export interface QueryClientHandlers {
  /** Called when any request (except those marked ignoreUnauthorized) answers 401. */
  onUnauthorized: (queryClient: QueryClient) => void;
}

export function createQueryClient(handlers: QueryClientHandlers): QueryClient {
  const handleError = (error: unknown, meta: RequestMeta | undefined, toast: boolean): void => {
    if (isApiError(error) && error.status === 401 && !meta?.ignoreUnauthorized) {
      handlers.onUnauthorized(queryClient);
      return;
    }
    if (toast && !meta?.inlineErrors) toasts.error(errorMessage(error));
  };

  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      // A first load that fails shows its error state in place; a refresh that fails
      // behind data already on screen would go unnoticed, so that one is toasted.
      onError: (error, query) =>
        handleError(error, query.meta, query.state.data !== undefined || !!query.meta?.toastErrors),
    }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => handleError(error, mutation.meta, true),
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        // A 4xx will not get better by asking again.
        retry: (failureCount, error) =>
          !(isApiError(error) && error.status < 500) && failureCount < 2,
      },
    },
  });
  return queryClient;
}
