import { Alert, Snackbar } from '@mui/material';
import { toasts, useToasts } from '@/lib/toast-store';

/** Shows queued toasts one at a time (raised by the query client's error hooks). */
export function Toaster() {
  const [current] = useToasts();
  if (!current) return null;
  const close = () => toasts.dismiss(current.id);
  return (
    <Snackbar
      key={current.id}
      open
      autoHideDuration={current.severity === 'error' ? 8000 : 4000}
      onClose={(_event, reason) => reason !== 'clickaway' && close()}
      // Bottom left, over the navigation's empty foot: never over a form's action buttons.
      anchorOrigin={{ vertical: 'bottom', horizontal: 'left' }}
    >
      <Alert severity={current.severity} variant="filled" onClose={close} sx={{ width: '100%' }}>
        {current.message}
      </Alert>
    </Snackbar>
  );
}
