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
