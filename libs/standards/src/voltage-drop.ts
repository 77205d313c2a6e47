import { materialById, resistanceFactor, type MaterialId } from './materials.js';
import { requireIncrement } from './methods/common.js';
import { requireNonNegative, requirePositive, requireTemperature } from './validate.js';

export interface VoltageDropInput {
  /** Metal cross-section of the conductor, mm² (nominal or measured). */
  areaMm2: number;
  material?: MaterialId;
  /** Length of the whole circuit, power plus ground, m (REFERENCE §7). */
  circuitLengthM: number;
  currentA: number;
  /** Conductor temperature, °C. Default 20 °C. */
  temperatureC?: number;
  /**
   * Stranding increment k: a stranded conductor's resistance per cable metre is (1 + k)
   * times the solid's (REFERENCE §2). Default 0.02, ASTM B496's standard increment, the same
   * as `areaFromResistance`; pass 0 for a solid conductor.
   */
  strandingIncrement?: number;
}

export interface VoltageDrop {
  volts: number;
  /** Resistance of the whole circuit, Ω. */
  resistanceOhm: number;
  /** Resistance per metre of conductor at the temperature, Ω/m. */
  resistancePerMetreOhm: number;
}

/** Voltage drop of a run: V = I · R, R = ρ₂₀ (1 + α₂₀ (t − 20)) (1 + k) · L / A (REFERENCE §2, §7). */
export function voltageDrop(input: VoltageDropInput): VoltageDrop {
  const areaMm2 = requirePositive('areaMm2', input.areaMm2);
  const material = materialById(input.material ?? 'copper');
  const lengthM = requirePositive('circuitLengthM', input.circuitLengthM);
  const currentA = requireNonNegative('currentA', input.currentA);
  const t = requireTemperature('temperatureC', input.temperatureC ?? 20);
  const k = requireIncrement(input.strandingIncrement ?? 0.02);
  const resistancePerMetreOhm =
    (material.resistivityOhmMm2PerM * resistanceFactor(material, t) * (1 + k)) / areaMm2;
  const resistanceOhm = resistancePerMetreOhm * lengthM;
  return { volts: currentA * resistanceOhm, resistanceOhm, resistancePerMetreOhm };
}

/** Installers aim to keep the drop under about 0.5 V (common practice; REFERENCE §7). */
export const TYPICAL_MAX_DROP_V = 0.5;
/** … or 3 % for critical circuits (common practice; marine tables use 3 % and 10 %). */
export const TYPICAL_MAX_DROP_FRACTION = 0.03;

/** The cautions to show beside any drop figure (REFERENCE §7). */
export const INSTALLER_CAUTIONS: readonly string[] = Object.freeze([
  'Keep the drop under about 0.5 V, or 3 % for critical circuits (common practice).',
  'The fuse protects the wire, not the equipment: fit it close to the battery. A fuse sized for the label may not protect an undersized conductor.',
  'Size the ground conductor like the power conductor (common practice).',
  "Always defer to local codes, the equipment maker's instructions and licensed practice.",
]);
