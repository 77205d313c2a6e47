import { CURRENCY_CODE, LOTS_PER_REQUEST } from '@gaugeproof/api-types';
import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional, type ApiPropertyOptions } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
  MinLength,
} from 'class-validator';
import { queryBoolean } from './paging';
import { MAX_ID } from './validators';

/*
 * Property rules several DTOs share, written once. Each stands for the decorators its
 * properties carried one above the other, applied in the same order (a stack applies its
 * lowest decorator first), so class-validator reports the same sentences in the same order
 * and the OpenAPI document does not change. Sentences name the property through
 * class-validator's `$property` and the limit through `$constraint1`.
 */
export const stacked = (...decorators: PropertyDecorator[]) =>
  applyDecorators(...decorators.reverse());

const WHOLE = { message: '$property must be a whole number' };
const AT_LEAST = { message: '$property must be at least $constraint1 characters' };
const AT_MOST = { message: '$property must be at most $constraint1 characters' };

/** A record id or a version in a body: a whole number from 1. */
export const IsWholeFromOne = () => stacked(IsInt(WHOLE), Min(1, WHOLE));

/**
 * The version of a record an edit was made on (issue 17 item 7): required, a whole number
 * within the id columns' range; a stale one gets 409.
 */
export const EditVersion = (description: string) =>
  stacked(ApiProperty({ description }), IsInt(WHOLE), Min(1, WHOLE), Max(MAX_ID, WHOLE));

const oneOf = (values: readonly (string | number)[]) => ({
  message: `$property must be one of ${values.join(', ')}`,
});

/** One of an enum's values (the contract's tuple), each named in the sentence. */
export const OneOf = (values: readonly (string | number)[], doc: ApiPropertyOptions = {}) =>
  stacked(ApiProperty({ enum: values, ...doc }), IsIn(values, oneOf(values)));

/** Optionally one of an enum's values. */
export const OptionalOneOf = (values: readonly (string | number)[], doc: ApiPropertyOptions = {}) =>
  stacked(ApiPropertyOptional({ enum: values, ...doc }), IsOptional(), IsIn(values, oneOf(values)));

const TRUE_OR_FALSE = { message: '$property must be true or false' };

/** An optional true or false in a body. */
export const OptionalFlag = (doc?: ApiPropertyOptions) =>
  stacked(ApiPropertyOptional(doc), IsOptional(), IsBoolean(TRUE_OR_FALSE));

/** An optional true or false in a query string (`?active=false`, `?overdue=true`). */
export const QueryFlag = (doc?: ApiPropertyOptions) =>
  stacked(
    ApiPropertyOptional(doc),
    IsOptional(),
    Transform(queryBoolean),
    IsBoolean(TRUE_OR_FALSE),
  );

/** A name or a serial: text of 1 to `max` characters (`$property is required` when empty). */
export const RequiredName = (max: number, doc?: ApiPropertyOptions) =>
  stacked(
    ApiProperty(doc),
    IsString(),
    MinLength(1, { message: '$property is required' }),
    MaxLength(max),
  );

/** The version a step or review was taken on (optimistic lock; a stale one gets 409). */
export const StepVersion = (description: string, required = true) =>
  required
    ? stacked(ApiProperty({ description }), IsWholeFromOne())
    : stacked(ApiPropertyOptional({ description }), IsOptional(), IsWholeFromOne());

/** An optional record id in a query string (`?supplierId=3`). */
export const OptionalQueryId = () =>
  stacked(
    ApiPropertyOptional(),
    IsOptional(),
    Type(() => Number),
    IsWholeFromOne(),
  );

/** Optional text of at most `max` characters (at least `min` when given). */
export const OptionalText = (max: number, doc?: ApiPropertyOptions, min?: number) =>
  stacked(
    ApiPropertyOptional(doc),
    IsOptional(),
    IsString(),
    ...(min === undefined ? [] : [MinLength(min, AT_LEAST)]),
    MaxLength(max, AT_MOST),
  );

/** Required text of `min` to `max` characters: `$property must be text` when it is none. */
export const RequiredText = (min: number, max: number, doc?: ApiPropertyOptions) =>
  stacked(
    ApiProperty(doc),
    IsString({ message: '$property must be text' }),
    MinLength(min, AT_LEAST),
    MaxLength(max, AT_MOST),
  );

/** A calendar day written YYYY-MM-DD. */
export const IsDay = () =>
  Matches(/^\d{4}-\d{2}-\d{2}$/, { message: '$property must be a date YYYY-MM-DD' });

/** An optional ISO 4217 currency code. */
export const OptionalCurrency = (doc: ApiPropertyOptions) =>
  stacked(
    ApiPropertyOptional({ example: 'EUR', ...doc }),
    IsOptional(),
    Matches(CURRENCY_CODE, { message: 'currency must be an ISO 4217 code such as EUR or USD' }),
  );

/**
 * The lots a return or a SCAR is about: up to LOTS_PER_REQUEST.max distinct lot ids. `atLeastOne`: the
 * sentence when the list is empty (a SCAR may name none).
 */
export const LotIdList = (atLeastOne?: string) =>
  stacked(
    IsArray({ message: 'lotIds must be a list of lot ids' }),
    ...(atLeastOne === undefined ? [] : [ArrayMinSize(1, { message: atLeastOne })]),
    ArrayMaxSize(LOTS_PER_REQUEST.max, {
      message: `lotIds can name at most ${LOTS_PER_REQUEST.max} lots`,
    }),
    ArrayUnique({ message: 'lotIds must not repeat a lot' }),
    IsInt({ each: true, message: 'each lot id must be a whole number' }),
    Min(1, { each: true, message: 'each lot id must be a whole number' }),
  );

/** A comma list of a status enum's values in a query string (`?status=open,reopened`). */
export const StatusList = (values: readonly string[]) => {
  const one = values.join('|');
  return stacked(
    ApiPropertyOptional({ description: `Comma list of ${values.join(', ')}` }),
    IsOptional(),
    Matches(new RegExp(`^(${one})(,(${one}))*$`), {
      message: `status must be a comma list of ${values.join(', ')}`,
    }),
  );
};
