import {
  applyDecorators,
  BadRequestException,
  PayloadTooLargeException,
  UseInterceptors,
  type CallHandler,
  type ExecutionContext,
  type NestInterceptor,
  type Type,
} from '@nestjs/common';
import { ApiBody, ApiConsumes } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import multer, { MulterError } from 'multer';
import { from, switchMap, type Observable } from 'rxjs';

function explain(err: unknown, tooLarge: string): Error {
  if (err instanceof MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return new PayloadTooLargeException(tooLarge);
    if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') {
      return new BadRequestException(['Send one file, in the form field "file"']);
    }
    return new BadRequestException([`The upload was refused: ${err.message}`]);
  }
  return new BadRequestException(['The upload could not be read as a multipart form']);
}

/**
 * An interceptor reading one multipart `file` field into memory within `maxBytes`, turning
 * multer's errors into clear messages (413 with `tooLarge` for an oversize file).
 */
export function singleFileInterceptor(maxBytes: number, tooLarge: string): Type<NestInterceptor> {
  class SingleFileInterceptor implements NestInterceptor {
    private readonly upload = multer({
      storage: multer.memoryStorage(),
      limits: { fileSize: maxBytes, files: 1, fields: 4, fieldSize: 4096 },
    }).single('file');

    intercept(ctx: ExecutionContext, next: CallHandler): Observable<unknown> {
      const req = ctx.switchToHttp().getRequest<Request>();
      const res = ctx.switchToHttp().getResponse<Response>();
      const parsed = new Promise<void>((resolve, reject) =>
        this.upload(req, res, (err: unknown) => (err ? reject(explain(err, tooLarge)) : resolve())),
      );
      return from(parsed).pipe(switchMap(() => next.handle()));
    }
  }
  return SingleFileInterceptor;
}

/**
 * A route taking one uploaded `file` (read by `interceptor`, from `singleFileInterceptor`)
 * as a multipart form, described as such in the OpenAPI document: the file's description
 * and the form's other fields.
 */
export function FileUpload(
  interceptor: Type<NestInterceptor>,
  file: string,
  fields: Record<string, object> = {},
) {
  return applyDecorators(
    UseInterceptors(interceptor),
    ApiConsumes('multipart/form-data'),
    ApiBody({
      schema: {
        type: 'object',
        required: ['file'],
        properties: { file: { type: 'string', format: 'binary', description: file }, ...fields },
      },
    }),
  );
}
