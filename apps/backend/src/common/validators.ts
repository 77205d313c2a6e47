import { ValidateBy, type ValidationOptions } from 'class-validator';
import { isCalendarDate } from './calendar';

/**
 * A whole number from `min` to `max`, checked as one rule so a bad value gets one message
 * (IsInt + Min + Max would give the same sentence two or three times).
 */
export function IsWholeNumber(min: number, max: number, options: ValidationOptions) {
  return ValidateBy(
    {
      name: 'isWholeNumber',
      constraints: [min, max],
      validator: {
        validate: (value: unknown) =>
          typeof value === 'number' && Number.isInteger(value) && value >= min && value <= max,
      },
    },
    options,
  );
}

/**
 * The largest record id: ids are 32-bit integer columns on PostgreSQL (and SQLite's are
 * far larger), so a bigger one cannot name a record (PostgreSQL documentation, "Numeric
 * Types": integer is -2147483648 to +2147483647).
 */
export const MAX_ID = 2_147_483_647;

/** A record id: a whole number from 1 (one message whatever is wrong). */
export function IsId(options: ValidationOptions) {
  return IsWholeNumber(1, MAX_ID, options);
}

/** A real calendar date written YYYY-MM-DD (no 2026-02-30). */
export function IsCalendarDate(options: ValidationOptions) {
  return ValidateBy(
    { name: 'isCalendarDate', validator: { validate: (value: unknown) => isCalendarDate(value) } },
    options,
  );
}
