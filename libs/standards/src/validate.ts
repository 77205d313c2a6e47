import { StandardsInputError } from './errors.js';

/** A finite number (any sign). */
export function requireFinite(field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new StandardsInputError(
      field,
      `${field} must be a finite number (got ${String(value)}).`,
    );
  }
  return value;
}

/** A finite number above zero: sizes, masses, lengths, resistances. */
export function requirePositive(field: string, value: unknown): number {
  const n = requireFinite(field, value);
  if (n <= 0) {
    throw new StandardsInputError(field, `${field} must be greater than zero (got ${n}).`);
  }
  return n;
}

/** A finite number of zero or more: resolutions, tolerances, increments. */
export function requireNonNegative(field: string, value: unknown): number {
  const n = requireFinite(field, value);
  if (n < 0) {
    throw new StandardsInputError(field, `${field} must not be negative (got ${n}).`);
  }
  return n;
}

/** A whole number of at least `min`. */
export function requireInteger(field: string, value: unknown, min: number): number {
  const n = requireFinite(field, value);
  if (!Number.isInteger(n) || n < min) {
    throw new StandardsInputError(
      field,
      `${field} must be a whole number of at least ${min} (got ${n}).`,
    );
  }
  return n;
}

/** A temperature the formulas are meant for: conductor temperatures of −50 … 250 °C. */
export function requireTemperature(field: string, value: unknown): number {
  const t = requireFinite(field, value);
  // Our own plausibility range, no source: outside it a reading is almost surely a typo.
  if (t < -50 || t > 250) {
    throw new StandardsInputError(field, `${field} must be between -50 and 250 °C (got ${t}).`);
  }
  return t;
}

/** One of a fixed list of values. */
export function requireOneOf<T extends string>(
  field: string,
  value: unknown,
  allowed: readonly T[],
): T {
  if (typeof value !== 'string' || !(allowed as readonly string[]).includes(value)) {
    throw new StandardsInputError(
      field,
      `${field} must be one of ${allowed.join(', ')} (got ${String(value)}).`,
    );
  }
  return value as T;
}
