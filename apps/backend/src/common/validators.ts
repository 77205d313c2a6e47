import { ValidateBy, type ValidationOptions } from 'class-validator';

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
