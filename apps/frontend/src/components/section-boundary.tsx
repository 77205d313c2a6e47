import { Alert, Button } from '@mui/material';
import { QueryErrorResetBoundary } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { ErrorBoundary } from '@/components/error-boundary';

/** Section-level boundary: the rest of the screen keeps working if this part breaks. */
export function SectionBoundary({ name, children }: { name: string; children: ReactNode }) {
  return (
    <QueryErrorResetBoundary>
      {({ reset: resetQueries }) => (
        <ErrorBoundary
          fallback={({ error, reset }) => (
            <Alert
              severity="error"
              action={
                <Button
                  color="inherit"
                  onClick={() => {
                    resetQueries();
                    reset();
                  }}
                >
                  Try again
                </Button>
              }
            >
              The {name} could not be shown: {error.message}
            </Alert>
          )}
        >
          {children}
        </ErrorBoundary>
      )}
    </QueryErrorResetBoundary>
  );
}
