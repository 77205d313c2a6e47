import { Alert, Button, CircularProgress, Stack, Typography } from '@mui/material';
import type { UseQueryResult } from '@tanstack/react-query';
import { errorMessage } from '@/lib/query-client';

/** What the Lot page and bench mode show while their lot loads or when it failed; null once loaded. */
export function lotLoadFallback(lot: UseQueryResult<unknown>, lotId: number, waiting = false) {
  if (lot.isPending || waiting) {
    return (
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
        <CircularProgress size={24} aria-label={`Loading lot ${lotId}`} />
        <Typography>Loading lot {lotId}…</Typography>
      </Stack>
    );
  }
  if (lot.isError) {
    return (
      <Alert
        severity="error"
        action={
          <Button color="inherit" onClick={() => void lot.refetch()}>
            Try again
          </Button>
        }
      >
        Lot {lotId} could not be loaded: {errorMessage(lot.error)}
      </Alert>
    );
  }
  return null;
}
