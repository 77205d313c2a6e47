import { isApiError } from '@/lib/api-client';

export interface SplitServerErrors<F extends string> {
  /** First server message per form field, e.g. { email: 'email must be an email' }. */
  fieldErrors: Partial<Record<F, string>>;
  /** Messages that name no field of this form, to show above it. */
  formErrors: string[];
}

/**
 * The server's validation messages name the field they are about first
 * ("password must be longer than or equal to 10 characters"); sort them onto the form.
 */
export function splitServerErrors<F extends string>(
  error: unknown,
  fields: readonly F[],
): SplitServerErrors<F> {
  const result: SplitServerErrors<F> = { fieldErrors: {}, formErrors: [] };
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
