import { isApiError } from '@/lib/api-client';

export interface SplitServerErrors<F extends string> {
  /** First server message per form field, e.g. { email: 'email must be an email' }. */
  fieldErrors: Partial<Record<F, string>>;
  /** Messages that name no field of this form, to show above it. */
  formErrors: string[];
}

/**
 * Sorts the server's problems onto the form by the field each names (the contract's
 * ErrorBody `errors[].field`), never by the wording of a message. A problem naming no field
 * of this form, and an error that is no server answer (the network), go above the form.
 */
export function splitServerErrors<F extends string>(
  error: unknown,
  fields: readonly F[],
): SplitServerErrors<F> {
  const result: SplitServerErrors<F> = { fieldErrors: {}, formErrors: [] };
  const listed = isApiError(error) ? error.body?.errors : undefined;
  if (!listed) {
    result.formErrors.push(...(isApiError(error) ? error.messages : [errorText(error)]));
    return result;
  }
  for (const { field: name, message } of listed) {
    // A nested property (`conductors.0.gauge`) belongs to the form field holding it.
    const field = fields.find((c) => c === name || (name ?? '').startsWith(`${c}.`));
    if (field && result.fieldErrors[field] === undefined) result.fieldErrors[field] = message;
    else if (!field) result.formErrors.push(message);
  }
  return result;
}

const errorText = (error: unknown) => (error instanceof Error ? error.message : String(error));
