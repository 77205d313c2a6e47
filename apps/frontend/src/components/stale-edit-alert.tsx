import { Alert, AlertTitle, Button, Stack } from '@mui/material';
import { isApiError } from '@/lib/api-client';

/**
 * The record as it is now, when the server refused an edit made on an old copy (409 with
 * `current`, docs/api-conventions.md); null for any other error.
 */
export function staleCurrent<T>(error: unknown): T | null {
  if (!isApiError(error) || error.status !== 409) return null;
  const current = (error.body as { current?: T } | null)?.current;
  return current ?? null;
}

interface StaleEditAlertProps {
  /** The record in words: "this supplier". */
  what: string;
  /** Shows their version in the form; the user's changes go. */
  onLoadTheirs: () => void;
  /** Saves the user's changed fields again on the current version. */
  onSaveMine: () => void;
  saving?: boolean;
}

/**
 * Someone saved the record after this form was opened: says so plainly, keeps the user's
 * changes in the form, and lets them choose (never a silent overwrite or a silent loss).
 */
export function StaleEditAlert({ what, onLoadTheirs, onSaveMine, saving }: StaleEditAlertProps) {
  return (
    <Alert severity="warning" role="alert" sx={{ mb: 1 }}>
      <AlertTitle>Someone else saved {what} while you were editing</AlertTitle>
      Your changes are still in the form but were not saved. Load their version to see what they
      saved (your changes are dropped), or save your changes on top of theirs (only the fields you
      changed are written).
      <Stack direction="row" spacing={1} sx={{ mt: 1 }}>
        <Button size="small" variant="outlined" color="inherit" onClick={onLoadTheirs}>
          Load their version
        </Button>
        <Button
          size="small"
          variant="contained"
          color="warning"
          onClick={onSaveMine}
          loading={saving}
        >
          Save my changes
        </Button>
      </Stack>
    </Alert>
  );
}
