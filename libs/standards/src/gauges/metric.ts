import { StandardsInputError } from '../errors.js';
import type { Gauge } from './types.js';

/**
 * Nominal cross-sections of the IEC 60228 series from 0.5 to 240 mm² (IEC 60228 nominal
 * cross-sectional areas; the list is from memory, REFERENCE §4 quotes 6 … 50 mm² of it).
 */
export const METRIC_AREAS_MM2: readonly number[] = Object.freeze([
  0.5, 0.75, 1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120, 150, 185, 240,
]);

/** Canonical metric label: `25 mm²`, `2.5 mm²`. */
export function metricLabel(areaMm2: number): string {
  return `${areaMm2} mm²`;
}

/** The IEC 60228 size of `areaMm2`; anything off the series is refused. */
export function metricGauge(areaMm2: number): Gauge {
  const match = METRIC_AREAS_MM2.find((a) => Math.abs(a - areaMm2) < 1e-9);
  if (match === undefined) {
    throw new StandardsInputError(
      'label',
      `${areaMm2} mm² is not an IEC 60228 size (${METRIC_AREAS_MM2.join(', ')} mm²).`,
    );
  }
  return { system: 'metric', label: metricLabel(match), nominalAreaMm2: match };
}

/** Every metric size, smallest first (IEC 60228 series, from memory). */
export const METRIC_SIZES: readonly Gauge[] = Object.freeze(
  METRIC_AREAS_MM2.map((a) => Object.freeze(metricGauge(a))),
);
