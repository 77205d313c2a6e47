import {
  MATERIALS,
  resistanceFactor,
  STANDARD_STRANDING_INCREMENT,
  type MaterialId,
} from '@gaugeproof/standards';
import type { ReadingInputs } from '../inspection/reading-compute';
import { toResolution, type SeedRandom } from './seed-scenario-random';

/**
 * What a cut piece really is, in the invented story: its metal and its metal area. The seed
 * turns it into the raw readings a clerk would take (mass over a cut length, four-wire
 * resistance at the bench temperature, strand count and diameter); the standards library
 * then computes every result from those readings alone, exactly as for a real reading.
 */
export interface TruePiece {
  metal: Extract<MaterialId, 'copper' | 'cca10'>;
  areaMm2: number;
  strands: number;
}

/**
 * Copper-clad aluminium as sold: a little better than ASTM B566 class 10A's maximum
 * resistivity (0.02741 Ω·mm²/m, standards library), as real CCA usually is (from memory).
 */
const CCA_RESISTIVITY = 0.0265;
/** The stranding the invented cables really have: ASTM B496's standard 2 % lay increment. */
const K = STANDARD_STRANDING_INCREMENT;

/** Balance 0.01 g, rule 1 mm, meter 1 µΩ, thermometer 0.1 °C, micrometer 0.001 mm. */
export const RESOLUTION = { g: 0.01, mm: 1, ohm: 0.000001, degC: 0.1, strandMm: 0.001 };

export function massInputs(piece: TruePiece, rnd: SeedRandom): ReadingInputs {
  const lengthMm = toResolution(rnd.between(300, 1000), RESOLUTION.mm);
  const density = MATERIALS[piece.metal].densityGPerCm3 / 1000; // g/mm³
  const mass = density * piece.areaMm2 * lengthMm * (1 + K) * (1 + rnd.jitter(0.0015));
  return { massG: toResolution(mass, RESOLUTION.g), lengthMm };
}

export function resistanceInputs(piece: TruePiece, rnd: SeedRandom): ReadingInputs {
  const lengthMm = toResolution(rnd.between(900, 1000), RESOLUTION.mm);
  const temperatureC = toResolution(rnd.between(17.5, 26.5), RESOLUTION.degC);
  const material = MATERIALS[piece.metal];
  const rho = piece.metal === 'cca10' ? CCA_RESISTIVITY : material.resistivityOhmMm2PerM;
  const r20 = (rho * (lengthMm / 1000) * (1 + K)) / piece.areaMm2;
  const r = r20 * resistanceFactor(material, temperatureC) * (1 + rnd.jitter(0.002));
  return { resistanceOhm: toResolution(r, RESOLUTION.ohm), lengthMm, temperatureC };
}

export function strandInputs(piece: TruePiece, rnd: SeedRandom): ReadingInputs {
  // Three strands measured, as recommended (common practice, REFERENCE §3).
  const d = Math.sqrt((4 * piece.areaMm2) / (Math.PI * piece.strands));
  const strandDiametersMm = [0, 1, 2].map(() =>
    toResolution(d * (1 + rnd.jitter(0.001)), RESOLUTION.strandMm),
  );
  return { count: piece.strands, strandDiametersMm };
}
