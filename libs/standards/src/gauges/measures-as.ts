import { StandardsInputError } from '../errors.js';
import { requirePositive } from '../validate.js';
import { AWG_SIZES } from './awg.js';
import { METRIC_SIZES } from './metric.js';
import type { Gauge, GaugeSystem } from './types.js';

export interface MeasuresAs {
  gauge: Gauge;
  /** Measured area ÷ that size's nominal area. */
  ratio: number;
}

/** ln of every nominal area, computed once: measuresAs runs on every keystroke. */
const LOG_AREAS: Record<GaugeSystem, readonly number[]> = {
  awg: AWG_SIZES.map((g) => Math.log(g.nominalAreaMm2)),
  metric: METRIC_SIZES.map((g) => Math.log(g.nominalAreaMm2)),
};

/** The standard sizes of a system, thickest first for AWG, smallest first for metric. */
export function standardSizes(system: GaugeSystem): readonly Gauge[] {
  if (system === 'awg') return AWG_SIZES;
  if (system === 'metric') return METRIC_SIZES;
  throw new StandardsInputError(
    'system',
    `system must be 'awg' or 'metric' (got ${String(system)}).`,
  );
}

/**
 * The standard size nearest to `areaMm2` on a logarithmic scale (the meaning of
 * "measures as"): the size whose nominal area is the smallest factor away, up or down.
 * An area beyond the ends of the series comes back as the end size, with its ratio.
 */
export function measuresAs(areaMm2: number, system: GaugeSystem = 'awg'): MeasuresAs {
  const area = requirePositive('areaMm2', areaMm2);
  const sizes = standardSizes(system);
  const logAreas = LOG_AREAS[system];
  const logArea = Math.log(area);
  let bestIndex = 0;
  for (let i = 1; i < sizes.length; i += 1) {
    if (Math.abs(logArea - logAreas[i]) < Math.abs(logArea - logAreas[bestIndex])) bestIndex = i;
  }
  const gauge = sizes[bestIndex];
  return { gauge, ratio: area / gauge.nominalAreaMm2 };
}

/**
 * The largest standard size whose nominal area `areaMm2` reaches (DESIGN.md's meaning of
 * "measures as"), or null when the area is below the smallest size of the system.
 */
export function largestSizeReached(
  areaMm2: number,
  system: GaugeSystem = 'awg',
): MeasuresAs | null {
  const area = requirePositive('areaMm2', areaMm2);
  let best: Gauge | null = null;
  for (const gauge of standardSizes(system)) {
    if (
      gauge.nominalAreaMm2 <= area &&
      (best === null || gauge.nominalAreaMm2 > best.nominalAreaMm2)
    ) {
      best = gauge;
    }
  }
  return best === null ? null : { gauge: best, ratio: area / best.nominalAreaMm2 };
}

/** What "measures as" says when the conductor meets no standard size at all. */
export const BELOW_SMALLEST_SIZE = 'below the smallest size';

/** The one "measures as" of a conductor (issue 13): a size label, or `BELOW_SMALLEST_SIZE`. */
export interface ConductorMeasuresAs {
  /** The size's label ("8 AWG", "16 mm²") or "below the smallest size". */
  label: string;
  /** The size, or null below the smallest. */
  gauge: Gauge | null;
}

export interface ConductorMeasuresAsInput {
  system: GaugeSystem;
  /** The measured (or copper-equivalent) area, mm²: the AWG rule and metric non-copper. */
  areaMm2: number;
  /** Minimum area as a fraction of nominal a size must reach: the product's policy, 0.98 by default (ASTM B496). */
  minAreaRatio?: number;
  /**
   * Metric copper: resistance at 20 °C per km of cable and the IEC 60228 limit of each size,
   * `maxOhmPerKm(areaMm2)`. When given, the size is judged by resistance (IEC 60228).
   */
  resistanceOhmPerKm?: number;
  maxOhmPerKm?: (nominalAreaMm2: number) => number;
}

/**
 * The one rule for "measures as" (issue 13), used on every screen, CSV and document: the
 * largest standard size the conductor meets. An AWG size (or a metric size of a metal IEC
 * 60228 gives no limits for) is met when the area reaches the product's minimum fraction of
 * its nominal area (98 % by default, ASTM B496), the same test as the verdict; a metric
 * copper size is met when the resistance at 20 °C does not exceed its IEC 60228 maximum.
 * Below every size: "below the smallest size".
 */
export function conductorMeasuresAs(input: ConductorMeasuresAsInput): ConductorMeasuresAs {
  const sizes = standardSizes(input.system);
  let best: Gauge | null = null;
  if (input.resistanceOhmPerKm !== undefined && input.maxOhmPerKm !== undefined) {
    const r = requirePositive('resistanceOhmPerKm', input.resistanceOhmPerKm);
    for (const g of sizes) {
      if (
        input.maxOhmPerKm(g.nominalAreaMm2) >= r &&
        (best === null || g.nominalAreaMm2 > best.nominalAreaMm2)
      ) {
        best = g;
      }
    }
  } else {
    const area = requirePositive('areaMm2', input.areaMm2);
    const ratio = requirePositive('minAreaRatio', input.minAreaRatio ?? 0.98);
    for (const g of sizes) {
      if (
        area >= ratio * g.nominalAreaMm2 &&
        (best === null || g.nominalAreaMm2 > best.nominalAreaMm2)
      ) {
        best = g;
      }
    }
  }
  return best === null
    ? { label: BELOW_SMALLEST_SIZE, gauge: null }
    : { label: best.label, gauge: best };
}

/** The next smaller standard size than `gauge`, or null when it is the smallest. */
export function nextSmallerSize(gauge: Gauge): Gauge | null {
  let best: Gauge | null = null;
  for (const g of standardSizes(gauge.system)) {
    if (
      g.nominalAreaMm2 < gauge.nominalAreaMm2 &&
      (best === null || g.nominalAreaMm2 > best.nominalAreaMm2)
    )
      best = g;
  }
  return best;
}
