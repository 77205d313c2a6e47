import { materialById, resistanceFactor, type MaterialId } from '../materials.js';
import {
  areaResult,
  component,
  exactConstant,
  resolutionUncertainty,
  type AreaResult,
} from '../uncertainty.js';
import { requireNonNegative, requireTemperature } from '../validate.js';
import { percentText, reading, requireIncrement, STANDARD_STRANDING_INCREMENT } from './common.js';

export interface AreaFromResistanceInput {
  /** DC resistance of the specimen, Ω, measured four-wire (Kelvin; REFERENCE §4). */
  resistanceOhm: number;
  /** Length between the voltage contacts, mm. */
  lengthMm: number;
  /** Conductor temperature at the reading, °C. Default 20 °C. */
  temperatureC?: number;
  material?: MaterialId;
  /** Stranding increment k; 0.02 is ASTM B496's standard 2 %. Use 0 for a solid conductor. */
  strandingIncrement?: number;
  /** Meter resolution, Ω. Default 1 µΩ (issue 3). */
  resistanceResolutionOhm?: number;
  /** Length rule division, mm. Default 1 mm (ASTM B263 division, REFERENCE §3). */
  lengthResolutionMm?: number;
  /** Thermometer resolution, °C. Default 0.1 °C (common practice, no source). */
  temperatureResolutionC?: number;
}

/**
 * Cross-section from resistance: R₂₀ = R_t / (1 + α₂₀ (t − 20)), then
 * A = ρ₂₀ · L · (1 + k) / R₂₀ (REFERENCE §2). With copper this is the copper-equivalent
 * area: the copper it conducts like, whatever metal is really inside.
 */
export function areaFromResistance(input: AreaFromResistanceInput): AreaResult {
  const material = materialById(input.material ?? 'copper');
  const k = requireIncrement(input.strandingIncrement ?? STANDARD_STRANDING_INCREMENT);
  const t = requireTemperature('temperatureC', input.temperatureC ?? 20);
  const r = reading(
    'resistanceOhm',
    input.resistanceOhm,
    'resistanceResolutionOhm',
    input.resistanceResolutionOhm ?? 1e-6,
  );
  const length = reading(
    'lengthMm',
    input.lengthMm,
    'lengthResolutionMm',
    input.lengthResolutionMm ?? 1,
  );
  const uT = resolutionUncertainty(
    requireNonNegative('temperatureResolutionC', input.temperatureResolutionC ?? 0.1),
  );

  const factor = resistanceFactor(material, t);
  const r20 = r.value / factor;
  const areaMm2 = (material.resistivityOhmMm2PerM * (length.value / 1000) * (1 + k)) / r20;

  return areaResult(
    areaMm2,
    [
      component(
        'resistance reading',
        r.value,
        'Ω',
        r.uResolution,
        -1,
        'meter resolution δ/√12 (GUM F.2.2.1)',
      ),
      component(
        'length between contacts',
        length.value,
        'mm',
        length.uResolution,
        1,
        'rule division δ/√12 (GUM F.2.2.1)',
      ),
      component(
        'temperature factor 1 + α₂₀(t − 20)',
        factor,
        '1',
        material.alpha20PerC * uT,
        1,
        `thermometer resolution δ/√12 (GUM F.2.2.1) at ${t} °C, times α₂₀`,
      ),
      exactConstant(
        `resistivity of ${material.name}`,
        material.resistivityOhmMm2PerM,
        'Ω·mm²/m',
        1,
        material.sources.resistivity,
      ),
      exactConstant(
        'temperature coefficient α₂₀',
        material.alpha20PerC,
        '1/°C',
        0,
        material.sources.alpha,
      ),
      exactConstant(
        'stranding factor 1 + k',
        1 + k,
        '1',
        1,
        'ASTM B496 standard increment when k = 0.02',
      ),
    ],
    `Resistivity (${material.resistivityOhmMm2PerM.toPrecision(5)} Ω·mm²/m), α₂₀ and the stranding increment (${percentText(k)}) are conventional constants treated as exact: the uncertainty covers the readings only.${material.id === 'copper' ? ' The area is copper-equivalent.' : ''}`,
  );
}
