import { StandardsInputError } from '../errors.js';
import { AWG_MAX, AWG_SIZES, awgGauge } from './awg.js';
import { METRIC_SIZES, metricGauge } from './metric.js';
import type { Gauge } from './types.js';

/** Canonical labels map straight to the shared, frozen size objects. */
const CANONICAL = new Map<string, Gauge>([...AWG_SIZES, ...METRIC_SIZES].map((g) => [g.label, g]));

const AWG_SUFFIX = /\s*(?:awg|a\.w\.g\.?|ga\.?|gauge|gage)$/;
const METRIC_SUFFIX = /^(\d+(?:[.,]\d+)?)\s*(?:mm²|mm2|mm\^2|sq\.?\s*mm|sqmm|mm sq\.?)$/;

/**
 * Reads a size the way the trade writes it: `4`, `4 AWG`, `4 ga`, `4 Gauge`, `#4`, `4AWG`,
 * `1/0`, `0`, `00`, `000`, `0000`, `2/0 AWG`, `25 mm²`, `25 mm2`, `25 sq mm`, `2,5 mm²`.
 * Returns the canonical standard size (a shared, frozen object); anything else throws
 * `StandardsInputError('label')`.
 * SAE sizes are refused on purpose: an SAE "4" is not an AWG 4 (REFERENCE §1, SAE J1127).
 */
export function parseGauge(label: string): Gauge {
  const known = typeof label === 'string' ? CANONICAL.get(label) : undefined;
  if (known !== undefined) return known;
  if (typeof label !== 'string' || label.trim() === '') {
    throw new StandardsInputError('label', 'Enter a size such as "4 AWG", "1/0" or "25 mm²".');
  }
  const text = label.trim().toLowerCase().replace(/\s+/g, ' ');
  if (/\bsae\b/.test(text)) {
    throw new StandardsInputError(
      'label',
      `"${label}" is an SAE size. SAE sizes are smaller than AWG sizes of the same number; record the label as AWG or mm² only if the product claims that.`,
    );
  }
  const metric = METRIC_SUFFIX.exec(text);
  if (metric) {
    const gauge = metricGauge(Number(metric[1].replace(',', '.')));
    return CANONICAL.get(gauge.label) ?? gauge;
  }

  const n = awgNumberOf(
    text
      .replace(AWG_SUFFIX, '')
      .replace(/^(?:#|no\.?\s*)/, '')
      .trim(),
  );
  if (n === undefined) {
    throw new StandardsInputError(
      'label',
      `"${label}" is not a size we know. Write it like "4 AWG", "1/0 AWG" or "25 mm²".`,
    );
  }
  const gauge = awgGauge(n);
  return CANONICAL.get(gauge.label) ?? gauge;
}

/** The B258 gauge number for `4`, `1/0`, `0`, `00` …, or undefined. */
function awgNumberOf(core: string): number | undefined {
  const aught = /^([1-4])\/0$/.exec(core);
  if (aught) return 1 - Number(aught[1]);
  if (/^0{1,4}$/.test(core)) return 1 - core.length;
  if (/^[1-9]\d?$/.test(core)) {
    const n = Number(core);
    return n <= AWG_MAX ? n : undefined;
  }
  return undefined;
}
