import { StandardsInputError } from '../errors.js';
import { MM2_PER_CMIL, MM_PER_IN } from '../units.js';
import type { Gauge } from './types.js';

/** Thickest and thinnest AWG sizes this library tabulates: 4/0 (n = −3) to 40 AWG. */
export const AWG_MIN = -3;
export const AWG_MAX = 40;

/**
 * Unrounded diameter of AWG gauge n: d = 0.005 in × 92^((36 − n)/39) (ASTM B258).
 * Aught sizes use n = 1 − m: 1/0 → 0, 2/0 → −1, 3/0 → −2, 4/0 → −3 (ASTM B258).
 */
export function awgDiameterInExact(n: number): number {
  return 0.005 * 92 ** ((36 - n) / 39);
}

/** Rounds to `figures` significant figures (decimal rounding of the final value only). */
export function roundSignificant(value: number, figures: number): number {
  return Number(value.toPrecision(figures));
}

/** Canonical AWG label: `4 AWG`, `1/0 AWG` … `4/0 AWG`. */
export function awgLabel(n: number): string {
  return n <= 0 ? `${1 - n}/0 AWG` : `${n} AWG`;
}

/**
 * Nominal geometry of AWG gauge n, rounded as ASTM B258 tabulates it:
 * - diameter in inches to 0.0001 in (B258: at most 4 significant figures, to 0.0001 in for
 *   sizes larger than 45 AWG), which gives 4 figures for 0.1 in and up and 3 below;
 * - circular mils: the rounded diameter in mils, squared, to the same number of significant
 *   figures as that diameter (ASTM B258; matches NEC Chapter 9 Table 8);
 * - mm²: the same square times 5.067 075 × 10⁻⁴ mm²/cmil, to the same figures, so only the
 *   final value is rounded (ASTM B258-18; REFERENCE §1 table);
 * - diameter in mm: the rounded inch diameter × 25.4 to 4 significant figures (REFERENCE §1).
 */
export function awgGauge(n: number): Gauge {
  if (!Number.isInteger(n) || n < AWG_MIN || n > AWG_MAX) {
    throw new StandardsInputError(
      'awg',
      `AWG sizes run from 4/0 to ${AWG_MAX} AWG (got gauge number ${String(n)}).`,
    );
  }
  const tenThousandths = Math.round(awgDiameterInExact(n) * 10_000);
  const figures = Math.min(4, String(tenThousandths).length);
  const diameterIn = tenThousandths / 10_000;
  const diameterMil = tenThousandths / 10;
  const squareMil = diameterMil * diameterMil;
  return {
    system: 'awg',
    label: awgLabel(n),
    awg: n,
    nominalAreaMm2: roundSignificant(squareMil * MM2_PER_CMIL, figures),
    nominalAreaCmil: roundSignificant(squareMil, figures),
    nominalDiameterIn: diameterIn,
    nominalDiameterMm: roundSignificant(diameterIn * MM_PER_IN, 4),
  };
}

/** Every AWG size from 4/0 to 40 AWG, thickest first, for a Reference gauge table. */
export const AWG_SIZES: readonly Gauge[] = Object.freeze(
  Array.from({ length: AWG_MAX - AWG_MIN + 1 }, (_, i) => Object.freeze(awgGauge(AWG_MIN + i))),
);
