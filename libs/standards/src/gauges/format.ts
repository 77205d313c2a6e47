import { StandardsInputError } from '../errors.js';
import { awgGauge } from './awg.js';
import { metricGauge } from './metric.js';
import type { Gauge, GaugeSystem } from './types.js';

/**
 * Canonical label of a size: a `Gauge`, an AWG gauge number (4/0 = −3 … 40) or, with
 * `system = 'metric'`, an IEC 60228 area in mm². `formatGaugeLabel(-1)` → `2/0 AWG`,
 * `formatGaugeLabel(25, 'metric')` → `25 mm²`.
 */
export function formatGaugeLabel(size: Gauge | number, system: GaugeSystem = 'awg'): string {
  if (typeof size === 'object' && size !== null) {
    if (size.system === 'awg' && size.awg !== undefined) return awgGauge(size.awg).label;
    return metricGauge(size.nominalAreaMm2).label;
  }
  if (typeof size !== 'number') {
    throw new StandardsInputError('size', 'A size must be a gauge or a number.');
  }
  return system === 'metric' ? metricGauge(size).label : awgGauge(size).label;
}
