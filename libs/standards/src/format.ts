/**
 * How figures are printed (GUM 7.2.6): the expanded uncertainty U to two significant
 * figures, the result to the same decimal place; ratios as percentages with one decimal.
 * Raw inputs are kept and shown in full elsewhere; these helpers are for results only.
 */

/** A result and its U rounded together (GUM 7.2.6). */
export interface RoundedMeasurement {
  /** The result, rounded to the decimal place of U's second significant figure. */
  value: string;
  /** U to two significant figures. */
  U: string;
  /** Decimal places used for both; negative when U is tens or more (rounded to 10, 100 …). */
  decimals: number;
}

/** Significant figures of U (GUM 7.2.6: "at most two significant digits"). */
export const UNCERTAINTY_SIGNIFICANT_FIGURES = 2;
/** Significant figures of a result shown without an uncertainty (common practice, no source). */
const RESULT_SIGNIFICANT_FIGURES_WITHOUT_U = 4;

function roundAt(value: number, decimals: number): string {
  if (decimals >= 0) {
    const text = value.toFixed(Math.min(decimals, 100));
    return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
  }
  const step = 10 ** -decimals;
  const rounded = Math.round(value / step) * step;
  return String(Object.is(rounded, -0) ? 0 : rounded);
}

/**
 * Rounds `value` and its expanded uncertainty `U` together (GUM 7.2.6): U to two significant
 * figures, the value to the same decimal place. `roundWithUncertainty(20.8138, 0.2189)` →
 * `{ value: '20.81', U: '0.22', decimals: 2 }`. With no usable U (0, negative, not finite)
 * the value keeps four significant figures and U is '0'.
 */
export function roundWithUncertainty(value: number, U: number): RoundedMeasurement {
  if (!Number.isFinite(value)) return { value: String(value), U: String(U), decimals: 0 };
  if (!Number.isFinite(U) || U <= 0) {
    const text = Number(value.toPrecision(RESULT_SIGNIFICANT_FIGURES_WITHOUT_U));
    const decimals = Math.max(0, (String(text).split('.')[1] ?? '').length);
    return { value: String(text), U: '0', decimals };
  }
  let decimals = UNCERTAINTY_SIGNIFICANT_FIGURES - 1 - Math.floor(Math.log10(U));
  // Rounding can carry U into the next decade (0.0996 → 0.10): keep two figures of the result.
  if (
    Number(U.toPrecision(UNCERTAINTY_SIGNIFICANT_FIGURES)) >=
    10 ** (UNCERTAINTY_SIGNIFICANT_FIGURES - decimals)
  ) {
    decimals -= 1;
  }
  return { value: roundAt(value, decimals), U: roundAt(U, decimals), decimals };
}

/**
 * "20.81 ± 0.22 mm²": a result with its expanded uncertainty at GUM 7.2.6 precision.
 * The unit, when given, follows after a space.
 */
export function formatWithUncertainty(value: number, U: number, unit?: string): string {
  const r = roundWithUncertainty(value, U);
  const suffix = unit ? ` ${unit}` : '';
  return `${r.value} ± ${r.U}${suffix}`;
}

/** A result alone, to the decimal place its U allows (GUM 7.2.6). */
export function formatValueAtUncertainty(value: number, U: number, unit?: string): string {
  const r = roundWithUncertainty(value, U);
  return unit ? `${r.value} ${unit}` : r.value;
}

/** A ratio as a percentage with one decimal: 0.39685 → "39.7 %". */
export function formatPercent(ratio: number): string {
  if (!Number.isFinite(ratio)) return `${String(ratio)} %`;
  const text = (ratio * 100).toFixed(1);
  return `${text === '-0.0' ? '0.0' : text} %`;
}
