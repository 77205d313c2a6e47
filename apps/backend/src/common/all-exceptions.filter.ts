import {
  ArgumentsHost,
  Catch,
  ExceptionFilter,
  HttpException,
  HttpStatus,
  Logger,
} from '@nestjs/common';
import {
  NotFoundError,
  OptimisticLockError,
  UniqueConstraintViolationException,
  ForeignKeyConstraintViolationException,
} from '@mikro-orm/core';
import type { ErrorBody as ContractErrorBody, ImportErrorBody } from '@gaugeproof/api-types';
import type { Request, Response } from 'express';
import { DomainError, type FieldError } from './domain-error';

/** The contract's ErrorBody (libs/api-types), with what a rule adds beside it (`current`, an import's rows). */
type ErrorBody = Omit<ContractErrorBody, 'errors'> & {
  errors: ContractErrorBody['errors'] | ImportErrorBody['errors'];
  [extra: string]: unknown;
};

const STATUS_NAMES: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  413: 'Payload Too Large',
  415: 'Unsupported Media Type',
  422: 'Unprocessable Entity',
  429: 'Too Many Requests',
  500: 'Internal Server Error',
};

/**
 * Every error leaves the server with the same body and never a stack trace or SQL, its
 * problems listed as `errors: [{field, message}]` (a DomainError's fields, the validation
 * pipe's properties; null where none).
 * Extra fields a service attaches to an HttpException body (e.g. `current` on a 409,
 * `errors` on an import) are passed through.
 */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const req = http.getRequest<Request & { id?: string }>();
    const res = http.getResponse<Response>();
    const requestId = String(req.id ?? '');
    const path = req.originalUrl ?? req.url;
    let status: number = HttpStatus.INTERNAL_SERVER_ERROR;
    let message: string | string[] = `Something went wrong on the server (reference ${requestId})`;
    let extra: Record<string, unknown> = {};

    if (exception instanceof DomainError) {
      status = exception.status;
      message = exception.bodyMessage;
      extra = { ...exception.details, errors: exception.errors };
    } else if (exception instanceof HttpException) {
      status = exception.getStatus();
      const body = exception.getResponse();
      if (typeof body === 'string') message = body;
      else {
        const { message: m, statusCode: _s, error: _e, ...rest } = body as Record<string, unknown>;
        message = Array.isArray(m) ? m.map(String) : String(m ?? exception.message);
        extra = rest;
      }
    } else if (exception instanceof NotFoundError) {
      status = 404;
      message = 'No such record';
    } else if (exception instanceof OptimisticLockError) {
      status = 409;
      message = 'Someone else changed this record first; reload and try again';
    } else if (exception instanceof UniqueConstraintViolationException) {
      status = 409;
      message = 'A record with the same unique value already exists';
    } else if (exception instanceof ForeignKeyConstraintViolationException) {
      status = 422;
      message = 'A referenced record does not exist';
    } else if (isBodyParserError(exception)) {
      status = exception.status;
      message =
        status === 413
          ? 'Request body is too large'
          : status === 415
            ? 'Request body must be UTF-8 text, not compressed'
            : 'Request body is not valid JSON';
    }
    if (status >= 500) {
      this.logger.error({ requestId, err: exception }, `Unhandled error on ${req.method} ${path}`);
    }
    const body: ErrorBody = {
      // Every error lists its problems as data; a field-less one has field null.
      errors: [message].flat().map((m): FieldError => ({ field: null, message: m })),
      ...extra,
      statusCode: status,
      error: STATUS_NAMES[status] ?? 'Error',
      message,
      path,
      requestId,
    };
    if (!res.headersSent) res.status(status).json(body);
    else res.end();
  }
}

function isBodyParserError(e: unknown): e is { status: number; type: string } {
  return (
    typeof e === 'object' &&
    e !== null &&
    typeof (e as { status?: unknown }).status === 'number' &&
    typeof (e as { type?: unknown }).type === 'string'
  );
}
