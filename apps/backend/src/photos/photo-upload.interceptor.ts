import {
  BadRequestException,
  Injectable,
  PayloadTooLargeException,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
} from '@nestjs/common';
import type { Request, Response } from 'express';
import multer, { MulterError } from 'multer';
import { from, switchMap, type Observable } from 'rxjs';

/** 15 MB: a phone photo is 2–8 MB (issue 4; common practice, no source). */
export const MAX_PHOTO_BYTES = 15 * 1024 * 1024;

function explain(err: unknown): Error {
  if (err instanceof MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') {
      return new PayloadTooLargeException(
        'The photo is larger than 15 MB: export it smaller (a phone photo is usually 2–8 MB) and try again.',
      );
    }
    if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') {
      return new BadRequestException(['Send one photo, in the form field "file"']);
    }
    return new BadRequestException([`The upload was refused: ${err.message}`]);
  }
  return new BadRequestException(['The upload could not be read as a multipart form']);
}

/**
 * Reads the multipart `file` field into memory with multer's limits, and turns multer's
 * errors into clear messages (413 for an oversize file) before the handler runs.
 */
@Injectable()
export class PhotoUploadInterceptor implements NestInterceptor {
  private readonly upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 4, fieldSize: 4096 },
  }).single('file');

  intercept(ctx: ExecutionContext, next: CallHandler): Observable<unknown> {
    const req = ctx.switchToHttp().getRequest<Request>();
    const res = ctx.switchToHttp().getResponse<Response>();
    const parsed = new Promise<void>((resolve, reject) =>
      this.upload(req, res, (err: unknown) => (err ? reject(explain(err)) : resolve())),
    );
    return from(parsed).pipe(switchMap(() => next.handle()));
  }
}
