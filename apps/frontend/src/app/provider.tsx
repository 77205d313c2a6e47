import { CssBaseline, ThemeProvider } from '@mui/material';
import { QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { theme } from '@/app/theme';
import { warmStart } from '@/app/warm-start';
import { ErrorBoundary } from '@/components/error-boundary';
import { FullPageError } from '@/components/full-page-state';
import { Toaster } from '@/components/toaster';
import { AuthProvider } from '@/features/auth/auth-context';
import { forgetOfflineAnswers } from '@/lib/offline-answers';
import { createQueryClient } from '@/lib/query-client';
import { UnitsProvider } from '@/lib/units';
import { queryKeys } from '@/lib/query-keys';

export function AppProvider({ children }: { children: ReactNode }) {
  const [queryClient] = useState(() => {
    const client = createQueryClient({
      // The session ended: forget the user; the sign-in gate then sends the user to
      // the sign-in page and remembers where they were. The service worker's copies of
      // its answers go too (the next sign-in drops the rest of the query cache).
      onUnauthorized: (c) => {
        c.setQueryData(queryKeys.auth.me(), null);
        void forgetOfflineAnswers();
      },
    });
    warmStart(client, window.location.pathname);
    return client;
  });

  return (
    <ThemeProvider theme={theme}>
      <CssBaseline />
      <ErrorBoundary
        fallback={({ error }) => (
          <FullPageError message={error.message} onRetry={() => window.location.reload()} />
        )}
      >
        <QueryClientProvider client={queryClient}>
          <AuthProvider>
            <UnitsProvider>{children}</UnitsProvider>
          </AuthProvider>
          <Toaster />
        </QueryClientProvider>
      </ErrorBoundary>
    </ThemeProvider>
  );
}
