import { isApiError } from '@/lib/api-client';

export interface SplitServerErrors<F extends string> {
  /** First server message per form field, e.g. { email: 'email must be an email' }. */
  fieldErrors: Partial<Record<F, string>>;
  /** Messages that name no field of this form, to show above it. */
  formErrors: string[];
}

/**
 * Sorts the server's problems onto the form by the field each names (`errors[].field`).
 * A body without that list (an older server) falls back to the field named first in
 * each message ("password must be longer than or equal to 10 characters").
 */
export function splitServerErrors<F extends string>(
  error: unknown,
  fields: readonly F[],
): SplitServerErrors<F> {
  const result: SplitServerErrors<F> = { fieldErrors: {}, formErrors: [] };
  const listed = isApiError(error) ? error.body?.errors : undefined;
  if (Array.isArray(listed)) {
    for (const { field: name, message } of listed) {
      // A nested property (`conductors.0.gauge`) belongs to the form field holding it.
      const field = fields.find((c) => c === name || (name ?? '').startsWith(`${c}.`));
      if (field && result.fieldErrors[field] === undefined) result.fieldErrors[field] = message;
      else if (!field) result.formErrors.push(message);
    }
    return result;
  }
  const messages = isApiError(error)
    ? error.messages
    : [error instanceof Error ? error.message : String(error)];
  for (const message of messages) {
    const firstWord = message.split(/[\s.:]/, 1)[0] ?? '';
    const field = fields.find((candidate) => candidate === firstWord);
    if (field && result.fieldErrors[field] === undefined) result.fieldErrors[field] = message;
    else if (!field) result.formErrors.push(message);
  }
  return result;
}
