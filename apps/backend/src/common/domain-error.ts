import type { FieldError } from '@gaugeproof/api-types';
/** One problem, on the request field it is about when there is one: the contract's shape. */
export type { FieldError };

/**
 * What a rule refuses, and why: `invalid` (400: the input cannot be read that way),
 * `not_found` (404), `conflict` (409: the record's state does not allow it now),
 * `refused` (422: a business rule says no).
 */
export type DomainErrorKind = 'invalid' | 'not_found' | 'conflict' | 'refused';

export const DOMAIN_STATUS: Record<DomainErrorKind, number> = {
  invalid: 400,
  not_found: 404,
  conflict: 409,
  refused: 422,
};

/**
 * The one error domain rules raise: data, not an HTTP exception. The exception filter maps
 * its kind to a status and its problems to `errors: [{field, message}]`; a caller that
 * needs the field (the CSV import's column) reads `errors`, never the message text.
 */
export class DomainError extends Error {
  /** The HTTP status its kind answers with. */
  readonly status: number;

  constructor(
    readonly kind: DomainErrorKind,
    readonly errors: readonly FieldError[],
    /** More data for the error body beside `errors` (the plausibility `questions`). */
    readonly details: Readonly<Record<string, unknown>> = {},
  ) {
    super(errors.map((e) => e.message).join(' '));
    this.name = 'DomainError';
    this.status = DOMAIN_STATUS[kind];
  }

  /** A business rule's refusal (422), on `field` when it is about one. */
  static refused(message: string, field: string | null = null): DomainError {
    return new DomainError('refused', [{ field, message }]);
  }

  /** A refusal with several problems, each on its field, and data beside them. */
  static refusedAll(
    errors: readonly FieldError[],
    details: Readonly<Record<string, unknown>> = {},
  ): DomainError {
    return new DomainError('refused', errors, details);
  }

  static conflict(message: string, field: string | null = null): DomainError {
    return new DomainError('conflict', [{ field, message }]);
  }

  static notFound(message: string): DomainError {
    return new DomainError('not_found', [{ field: null, message }]);
  }

  /** Input that cannot be read (400), one problem per field. */
  static invalid(errors: readonly FieldError[]): DomainError {
    return new DomainError('invalid', errors);
  }

  /** The `message` of the error body: a list for unreadable input, else one sentence. */
  get bodyMessage(): string | string[] {
    return this.kind === 'invalid' ? this.errors.map((e) => e.message) : this.message;
  }
}
