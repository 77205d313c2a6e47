import { StandardsInputError } from '../errors.js';
import { meanUncertainty, resolutionUncertainty, toleranceUncertainty } from '../uncertainty.js';
import { requireNonNegative, requirePositive } from '../validate.js';

/** ASTM B496 standard stranding increment for mass and resistance: 2 % (REFERENCE §3). */
export const STANDARD_STRANDING_INCREMENT = 0.02;

/** A stranding increment k: zero (solid) up to 0.5, our own plausibility bound (no source). */
export function requireIncrement(value: unknown): number {
  const k = requireNonNegative('strandingIncrement', value);
  if (k > 0.5) {
    throw new StandardsInputError(
      'strandingIncrement',
      `strandingIncrement is a fraction such as 0.02 for 2 % (got ${k}).`,
    );
  }
  return k;
}

/**
 * The value of one reading or the mean of several, with its standard uncertainty from the
 * instrument's resolution (δ/√12, GUM F.2.2.1) and, for several readings, the spread of
 * their mean (s/√n, GUM 4.2.3).
 */
export interface Reading {
  value: number;
  uResolution: number;
  uSpread: number;
  count: number;
}

export function reading(
  field: string,
  raw: unknown,
  resolutionField: string,
  resolution: unknown,
): Reading {
  const values = Array.isArray(raw) ? raw : [raw];
  if (values.length === 0) {
    throw new StandardsInputError(field, `${field} needs at least one reading.`);
  }
  const checked = values.map((v: unknown) => requirePositive(field, v));
  const value = checked.reduce((s, v) => s + v, 0) / checked.length;
  const uResolution = resolutionUncertainty(requireNonNegative(resolutionField, resolution));
  return { value, uResolution, uSpread: meanUncertainty(checked), count: checked.length };
}

/** u of an optional stated tolerance ±a (a/√3, GUM 4.3.7), 0 when none is given. */
export function optionalTolerance(field: string, halfWidth: unknown): number {
  return halfWidth === undefined ? 0 : toleranceUncertainty(requireNonNegative(field, halfWidth));
}

/** 0.02 → "2 %". */
export const percentText = (fraction: number): string =>
  `${Number((fraction * 100).toPrecision(6))} %`;
