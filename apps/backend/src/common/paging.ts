import { DomainError } from './domain-error';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, Max, Matches, Min } from 'class-validator';

/** `page`, `pageSize` and `sort` of every list (docs/api-conventions.md). */
export class ListQueryDto {
  @ApiPropertyOptional({ minimum: 1, default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'page must be a whole number of at least 1' })
  @Min(1, { message: 'page must be a whole number of at least 1' })
  readonly page?: number;

  @ApiPropertyOptional({ minimum: 1, maximum: 100, default: 25 })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'pageSize must be a whole number from 1 to 100' })
  @Min(1, { message: 'pageSize must be a whole number from 1 to 100' })
  @Max(100, { message: 'pageSize must be a whole number from 1 to 100' })
  readonly pageSize?: number;

  @ApiPropertyOptional({ description: 'field:asc or field:desc' })
  @IsOptional()
  @IsString()
  @Matches(/^[A-Za-z]+:(asc|desc)$/, { message: 'sort must look like field:asc or field:desc' })
  readonly sort?: string;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export interface Paging {
  page: number;
  pageSize: number;
  offset: number;
}

export function paging(q: ListQueryDto): Paging {
  const page = q.page ?? 1;
  const pageSize = q.pageSize ?? 25;
  return { page, pageSize, offset: (page - 1) * pageSize };
}

/**
 * The sort of a list as [field, direction], the field one of `allowed`; a field the list
 * cannot sort by is a 400 naming the ones it can.
 */
export function parseSort<F extends string>(
  sort: string | undefined,
  allowed: readonly F[],
  fallback: [F, 'asc' | 'desc'],
): [F, 'asc' | 'desc'] {
  if (!sort) return fallback;
  const [field, dir] = sort.split(':') as [string, 'asc' | 'desc'];
  if (!(allowed as readonly string[]).includes(field)) {
    throw DomainError.invalid([
      { field: 'sort', message: `sort field must be one of ${allowed.join(', ')}` },
    ]);
  }
  if (dir !== undefined && dir !== 'asc' && dir !== 'desc') {
    throw DomainError.invalid([{ field: 'sort', message: 'sort direction must be asc or desc' }]);
  }
  return [field as F, dir];
}

/** `true`/`false` from a query string; anything else is left for the validator to refuse. */
export function queryBoolean({ value }: { value: unknown }): unknown {
  if (value === 'true') return true;
  if (value === 'false') return false;
  return value;
}

/** Escapes LIKE wildcards so a search for "50%" means the text "50%". */
export function likePattern(text: string): string {
  return `%${text
    .trim()
    .toLowerCase()
    .replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
