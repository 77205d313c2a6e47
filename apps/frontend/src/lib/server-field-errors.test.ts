import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { splitServerErrors } from '@/lib/server-field-errors';

/** A 400 as the server's validation pipe answers it: each problem with the property it names. */
const badRequest = (...problems: { field: string | null; message: string }[]) =>
  new ApiError(
    400,
    {
      statusCode: 400,
      error: 'Bad Request',
      message: problems.length === 1 ? problems[0]!.message : problems.map((p) => p.message),
      errors: problems,
      path: '/api/users',
      requestId: 'r',
    },
    '',
  );

describe('splitServerErrors', () => {
  it('puts messages that start with a field name on that field', () => {
    const error = badRequest(
      { field: 'email', message: 'email must be an email' },
      { field: 'password', message: 'password is too short' },
      { field: 'x', message: 'property x should not exist' },
    );
    expect(splitServerErrors(error, ['email', 'password'] as const)).toEqual({
      fieldErrors: { email: 'email must be an email', password: 'password is too short' },
      formErrors: ['property x should not exist'],
    });
  });

  it('treats a single message naming no field as a form error', () => {
    expect(
      splitServerErrors(badRequest({ field: null, message: 'A user with this e-mail exists.' }), [
        'email',
      ] as const),
    ).toEqual({
      fieldErrors: {},
      formErrors: ['A user with this e-mail exists.'],
    });
  });

  it('puts each listed problem on the field it names, whatever its wording', () => {
    const error = new ApiError(
      422,
      {
        statusCode: 422,
        error: 'Unprocessable Entity',
        message: 'The balance is overdue.',
        path: '/api/samples/1/readings',
        requestId: 'r',
        errors: [
          { field: 'instrumentIds', message: 'The balance is overdue.' },
          { field: null, message: 'Lot PO-1 is already accepted.' },
        ],
      },
      '',
    );
    expect(splitServerErrors(error, ['instrumentIds', 'massG'] as const)).toEqual({
      fieldErrors: { instrumentIds: 'The balance is overdue.' },
      formErrors: ['Lot PO-1 is already accepted.'],
    });
  });
});
