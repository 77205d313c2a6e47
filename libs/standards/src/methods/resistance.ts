import { materialById, resistanceFactor, type MaterialId } from '../materials.js';
import {
  areaResult,
  component,
  exactConstant,
  instrumentComponents,
  toleranceUncertainty,
  type AreaResult,
  type InstrumentAccuracy,
} from '../uncertainty.js';
import { requireNonNegative, requireTemperature } from '../validate.js';
import {
  checkAccuracy,
  percentText,
  reading,
  requireIncrement,
  STANDARD_STRANDING_INCREMENT,
} from './common.js';

/**
 * Default bound on the difference between the conductor's temperature and the thermometer's
 * reading, ±1 °C (common practice, no source): a thermometer in the room air, not on the
 * conductor.
 */
export const DEFAULT_TEMPERATURE_DIFFERENCE_C = 1;

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
  /** Bound ±ΔT on conductor minus thermometer temperature, °C. Default 1 °C (no source). */
  temperatureDifferenceC?: number;
  /** The meter's stated accuracy and calibration, Ω (instrument register). */
  meter?: InstrumentAccuracy;
  /** The length rule's stated accuracy and calibration, mm (instrument register). */
  rule?: InstrumentAccuracy;
  /** The thermometer's stated accuracy and calibration, °C (instrument register). */
  thermometer?: InstrumentAccuracy;
}

/**
 * Cross-section from resistance: R₂₀ = R_t / (1 + α₂₀ (t − 20)), then
 * A = ρ₂₀ · L · (1 + k) / R₂₀ (REFERENCE §2). With copper this is the copper-equivalent
 * area: the copper it conducts like, whatever metal is really inside. The temperature enters
 * through the factor 1 + α₂₀(t − 20), whose sensitivity to t is α₂₀; the thermometer's own
 * terms and the conductor–thermometer difference (rectangular, ΔT/√3, GUM 4.3.7) add there.
 */
export function areaFromResistance(input: AreaFromResistanceInput): AreaResult {
  const material = materialById(input.material ?? 'copper');
  const k = requireIncrement(input.strandingIncrement ?? STANDARD_STRANDING_INCREMENT);
  const t = requireTemperature('temperatureC', input.temperatureC ?? 20);
  const rResolution = input.resistanceResolutionOhm ?? 1e-6;
  const lengthResolution = input.lengthResolutionMm ?? 1;
  const r = reading('resistanceOhm', input.resistanceOhm, 'resistanceResolutionOhm', rResolution);
  const length = reading('lengthMm', input.lengthMm, 'lengthResolutionMm', lengthResolution);
  const tResolution = requireNonNegative(
    'temperatureResolutionC',
    input.temperatureResolutionC ?? 0.1,
  );
  const deltaT = requireNonNegative(
    'temperatureDifferenceC',
    input.temperatureDifferenceC ?? DEFAULT_TEMPERATURE_DIFFERENCE_C,
  );
  const meter = checkAccuracy('meter', input.meter);
  const rule = checkAccuracy('rule', input.rule);
  const thermometer = checkAccuracy('thermometer', input.thermometer);

  const factor = resistanceFactor(material, t);
  const r20 = r.value / factor;
  const areaMm2 = (material.resistivityOhmMm2PerM * (length.value / 1000) * (1 + k)) / r20;

  // Thermometer terms are in °C; the factor moves by α₂₀ per °C, so scale each u by α₂₀.
  const alpha = material.alpha20PerC;
  const temperatureLines = instrumentComponents(
    'temperature',
    t,
    '°C',
    1,
    tResolution,
    thermometer,
    { resolutionNote: 'thermometer resolution' },
  ).map((c) =>
    component(
      `${c.name} (via 1 + α₂₀(t − 20))`,
      factor,
      '1',
      alpha * c.standardUncertainty,
      1,
      `${c.note}, times α₂₀`,
    ),
  );

  return areaResult(
    areaMm2,
    [
      ...instrumentComponents('resistance', r.value, 'Ω', -1, rResolution, meter, {
        resolutionNote: 'meter resolution',
      }),
      ...instrumentComponents(
        'length between contacts',
        length.value,
        'mm',
        1,
        lengthResolution,
        rule,
        {
          readings: 2,
          resolutionNote: 'rule division',
        },
      ),
      ...temperatureLines,
      component(
        'conductor − thermometer temperature',
        factor,
        '1',
        alpha * toleranceUncertainty(deltaT),
        1,
        `±${deltaT} °C between conductor and thermometer, ΔT/√3 (GUM 4.3.7), times α₂₀ = ${alpha.toPrecision(4)} /°C`,
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
    `Resistivity (${material.resistivityOhmMm2PerM.toPrecision(5)} Ω·mm²/m), α₂₀ and the stranding increment (${percentText(k)}) are conventional constants treated as exact: the uncertainty covers the instruments (resolution, stated accuracy, calibration), the length and the conductor's temperature.${material.id === 'copper' ? ' The area is copper-equivalent.' : ''}`,
  );
}
