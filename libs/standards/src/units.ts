/**
 * Unit conversions used across the trade. Names carry their units.
 */

/** Millimetres per inch: exact by definition (international inch of 1959; from memory). */
export const MM_PER_IN = 25.4;

/** Grams per pound: exact by definition (international pound of 1959; from memory). */
export const G_PER_LB = 453.59237;

/** Metres per foot: 12 in × 25.4 mm, exact (from memory). */
export const M_PER_FT = 0.3048;

/**
 * 1 circular mil = π/4 × (0.001 in)² = 5.067 075 × 10⁻⁴ mm² (REFERENCE §1; ASTM B258).
 * Computed from π rather than typed, so it carries every digit.
 */
export const MM2_PER_CMIL = (Math.PI / 4) * (0.001 * MM_PER_IN) ** 2;

export const cmilToMm2 = (cmil: number): number => cmil * MM2_PER_CMIL;
export const mm2ToCmil = (mm2: number): number => mm2 / MM2_PER_CMIL;
export const inToMm = (inches: number): number => inches * MM_PER_IN;
export const mmToIn = (mm: number): number => mm / MM_PER_IN;
export const milToMm = (mil: number): number => (mil / 1000) * MM_PER_IN;
export const mmToMil = (mm: number): number => (mm / MM_PER_IN) * 1000;

/** Area of a circle of diameter `diameterMm`, in mm². */
export const circleAreaMm2 = (diameterMm: number): number => (Math.PI / 4) * diameterMm ** 2;

/** Mass per metre (g/m, the same number as kg/km) of `massG` over `lengthMm`. */
export const gramsPerMetre = (massG: number, lengthMm: number): number => massG / (lengthMm / 1000);

/** Resistance per kilometre (Ω/km, the unit of IEC 60228) of `resistanceOhm` over `lengthMm`. */
export const ohmPerKm = (resistanceOhm: number, lengthMm: number): number =>
  resistanceOhm / (lengthMm / 1_000_000);

/** g/m to lb per 1000 ft, the US trade's conductor weight. */
export const gPerMToLbPerKft = (gPerM: number): number => (gPerM * M_PER_FT * 1000) / G_PER_LB;
export const lbPerKftToGPerM = (lbPerKft: number): number =>
  (lbPerKft * G_PER_LB) / (M_PER_FT * 1000);

/** Ω/km to Ω per 1000 ft, the unit of US resistance tables. */
export const ohmPerKmToOhmPerKft = (ohmKm: number): number => ohmKm * M_PER_FT;
export const ohmPerKftToOhmPerKm = (ohmKft: number): number => ohmKft / M_PER_FT;
