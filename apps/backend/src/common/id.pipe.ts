import {
  BadRequestException,
  Injectable,
  Param,
  type ArgumentMetadata,
  type PipeTransform,
} from '@nestjs/common';
import { MAX_ID } from './validators';

/**
 * A record id in the path (`/lots/:id`): digits only, from 1 to MAX_ID, else 400 with one
 * sentence. Nest's ParseIntPipe let 99999999999999999999 through, which PostgreSQL
 * refuses as out of range for an integer column (a 500 found by the abuse test).
 */
@Injectable()
export class IdPipe implements PipeTransform<string, number> {
  transform(value: string, meta: ArgumentMetadata): number {
    const id = /^\d{1,10}$/.test(value) ? Number(value) : NaN;
    if (!(id >= 1 && id <= MAX_ID)) {
      throw new BadRequestException(
        `${meta.data ?? 'id'} must be a record id: a whole number from 1 to ${MAX_ID}`,
      );
    }
    return id;
  }
}

/** The record id of the path, read through `IdPipe`: `@IdParam() id` (`@IdParam('fileId')`). */
export const IdParam = (name = 'id'): ParameterDecorator => Param(name, IdPipe);
