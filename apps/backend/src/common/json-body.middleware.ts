import { Injectable, type NestMiddleware } from '@nestjs/common';
import { json } from 'body-parser';
import type { NextFunction, Request, Response } from 'express';

/** Largest JSON body accepted (our choice: a readings import of a few thousand rows). */
export const JSON_BODY_LIMIT = '1mb';

/**
 * Parses JSON bodies inside Nest's middleware, after the request has its id, so a body
 * that is not JSON, too large or in an unknown charset is answered by AllExceptionsFilter
 * like every other error (400, 413 or 415, with the request id). Parsed at the Express
 * level, the error went past the static-site module's error handler, which answers any
 * error on an /api path with "404 Cannot POST".
 */
@Injectable()
export class JsonBodyMiddleware implements NestMiddleware {
  private readonly parse = json({ limit: JSON_BODY_LIMIT });

  use(req: Request, res: Response, next: NextFunction): Promise<void> {
    return new Promise<void>((resolve, reject) => {
      this.parse(req, res, (err?: unknown) => (err ? reject(err) : resolve()));
    }).then(() => next());
  }
}
