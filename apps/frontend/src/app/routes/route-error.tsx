import { Alert, AlertTitle, Box, Button } from '@mui/material';
import { isRouteErrorResponse, useRouteError } from 'react-router';
import { NotFoundRoute } from '@/app/routes/not-found';

/** Route-level boundary: a screen that fails to render shows this in its place. */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundRoute />;
  const message = error instanceof Error ? error.message : 'An unexpected error occurred.';
  return (
    <Box sx={{ p: 3 }}>
      <Alert
        severity="error"
        action={
          <Button color="inherit" onClick={() => window.location.reload()}>
            Reload
          </Button>
        }
      >
        <AlertTitle>This screen could not be shown</AlertTitle>
        {message}
      </Alert>
    </Box>
  );
}
