import { Alert, Box, Button, CircularProgress, Stack, Typography } from '@mui/material';

export function FullPageLoader({ label }: { label: string }) {
  return (
    <Box sx={{ minHeight: '100vh', display: 'grid', placeItems: 'center' }}>
      <Stack spacing={2} sx={{ alignItems: 'center' }}>
        <CircularProgress aria-label={label} />
        <Typography color="text.secondary">{label}</Typography>
      </Stack>
    </Box>
  );
}

interface FullPageErrorProps {
  title?: string;
  message: string;
  onRetry?: () => void;
}

export function FullPageError({
  title = 'Something went wrong',
  message,
  onRetry,
}: FullPageErrorProps) {
  return (
    <Box sx={{ minHeight: '100vh', display: 'grid', placeItems: 'center', p: 2 }}>
      <Alert
        severity="error"
        sx={{ maxWidth: 520 }}
        action={
          onRetry ? (
            <Button color="inherit" onClick={onRetry}>
              Try again
            </Button>
          ) : undefined
        }
      >
        <Typography variant="h6" component="h1">
          {title}
        </Typography>
        {message}
      </Alert>
    </Box>
  );
}
