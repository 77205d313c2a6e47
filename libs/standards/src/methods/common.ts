import { StandardsInputError } from '../errors.js';
import {
  component,
  meanUncertainty,
  resolutionUncertainty,
  type BudgetComponent,
  type InstrumentAccuracy,
} from '../uncertainty.js';
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

/** An instrument's stated accuracy and calibration, each checked: absent, or zero or more. */
export function checkAccuracy(field: string, accuracy: unknown): InstrumentAccuracy | undefined {
  if (accuracy === undefined || accuracy === null) return undefined;
  if (typeof accuracy !== 'object') {
    throw new StandardsInputError(field, `${field} must be an object of stated accuracies.`);
  }
  const a = accuracy as Record<string, unknown>;
  const out: InstrumentAccuracy = {};
  for (const key of [
    'accuracyPercentOfReading',
    'accuracyAbsolute',
    'calibrationUncertainty',
  ] as const) {
    if (a[key] !== undefined && a[key] !== null)
      out[key] = requireNonNegative(`${field}.${key}`, a[key]);
  }
  return out;
}

/**
 * The Type A line of several repeated readings: the standard deviation of their mean s/√n
 * (GUM 4.2.3) with ν = n − 1 degrees of freedom (GUM G.3.3), so few readings widen k through
 * Welch–Satterthwaite. None for a single reading.
 */
export function spreadComponent(
  name: string,
  r: Reading,
  unit: string,
  sensitivity: number,
): BudgetComponent[] {
  if (r.count < 2) return [];
  return [
    {
      ...component(
        name,
        r.value,
        unit,
        r.uSpread,
        sensitivity,
        `Type A: standard deviation of the mean of ${r.count} readings s/√n (GUM 4.2.3), ν = ${r.count - 1}`,
      ),
      degreesOfFreedom: r.count - 1,
    },
  ];
}

/** 0.02 → "2 %". */
export const percentText = (fraction: number): string =>
  `${Number((fraction * 100).toPrecision(6))} %`;
