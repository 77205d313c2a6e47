import { Alert } from '@mui/material';
import type { FieldValues, Path, UseFormReturn } from 'react-hook-form';
import { splitServerErrors } from '@/lib/server-field-errors';

/**
 * The form's submit handler: runs `action` with the checked values; when it throws, each of
 * the server's messages that names one of `fields` goes onto that field (its FormTextField
 * shows it); the rest stay on the error for `ServerErrorAlert` to show above the form.
 */
export function submitWithServerErrors<T extends FieldValues, O>(
  form: Pick<UseFormReturn<T, unknown, O>, 'handleSubmit' | 'setError'>,
  fields: readonly Path<T>[],
  action: (values: O) => Promise<unknown>,
) {
  return form.handleSubmit(async (values) => {
    try {
      await action(values);
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, fields);
      for (const field of fields) {
        const message = fieldErrors[field];
        if (message) form.setError(field, { type: 'server', message });
      }
    }
  });
}

/** The server's messages that name none of the form's fields, above the form; nothing without an error. */
export function ServerErrorAlert({
  error,
  fields,
}: {
  /** The mutation's error (null while there is none). */
  error: unknown;
  fields: readonly string[];
}) {
  if (error === null || error === undefined) return null;
  const { formErrors } = splitServerErrors(error, fields);
  if (formErrors.length === 0) return null;
  return <Alert severity="error">{formErrors.join(' ')}</Alert>;
}
