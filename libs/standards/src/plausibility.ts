import type { ReadingMethod } from './assess-sample.js';
import { formatPercent } from './format.js';
import type { IdentifiedMaterial } from './identify-material.js';

/**
 * A reading whose area is above 1.6 × nominal is questioned (issue 13; our own bound, no
 * source): no honest conductor is 60 % oversize, a slip of a decimal point or a unit is.
 */
export const PLAUSIBLE_AREA_RATIO = 1.6;
/** A strand count more than 10 % off the claimed count is questioned (issue 13; no source). */
export const STRAND_COUNT_TOLERANCE = 0.1;

export interface PlausibilityInput {
  method: ReadingMethod;
  /** The label's nominal area, mm². */
  nominalAreaMm2: number;
  /** The area this reading gives, mm² (claimed metal). */
  areaMm2: number;
  /** The strand count the product claims (strands method), if known. */
  claimedStrands?: number;
  /** The strand count the clerk counted (strands method). */
  countedStrands?: number;
  /** The material the sample's readings point to, when a mass and a resistance were combined. */
  identification?: IdentifiedMaterial;
  /** Field names as the form and the API name them, for the message. */
  fields?: Partial<
    Record<'mass' | 'resistance' | 'count' | 'strandDiameters' | 'diameter', string>
  >;
}

/** One question to the clerk: the field it is about and the likely slip, in a sentence. */
export interface PlausibilityQuestion {
  field: string;
  message: string;
}

const near = (ratio: number, target: number): boolean =>
  ratio > target / 1.6 && ratio < target * 1.6;

function slip(ratio: number, what: string): string {
  if (near(ratio, 1000)) return `about a thousand times ${what}: a unit slip (g for mg, Ω for mΩ)?`;
  if (near(ratio, 100)) return `about a hundred times ${what}: a unit or decimal slip?`;
  if (near(ratio, 10)) return `about ten times ${what}: a decimal point?`;
  if (near(ratio, 4))
    return `about four times ${what}: a diameter typed for a radius, or the wrong size?`;
  return `${formatPercent(ratio)} of ${what}: check the reading and the length.`;
}

/**
 * Questions a reading that is more likely a typing slip than a conductor (issue 13): an
 * area above 1.6 × nominal, a strand count more than 10 % off the claim, or a
 * mass–resistivity product that fits no metal. Undersized readings are never questioned: a
 * conductor at 40 % of nominal is the fraud the product exists to catch. The server refuses
 * a questioned reading unless the clerk confirms it (`confirmUnusual`).
 */
export function questionReading(input: PlausibilityInput): PlausibilityQuestion[] {
  const f = {
    mass: 'massG',
    resistance: 'resistanceOhm',
    count: 'count',
    strandDiameters: 'strandDiametersMm',
    diameter: 'diameterMm',
    ...input.fields,
  };
  const questions: PlausibilityQuestion[] = [];
  const ratio = input.areaMm2 / input.nominalAreaMm2;
  if (ratio > PLAUSIBLE_AREA_RATIO) {
    switch (input.method) {
      case 'mass':
        questions.push({
          field: f.mass,
          message: `${f.mass} is ${slip(ratio, 'the nominal mass')}`,
        });
        break;
      case 'resistance':
        questions.push({
          field: f.resistance,
          message: `${f.resistance} gives ${slip(ratio, 'the nominal area')} Check the unit (Ω or mΩ) and the length.`,
        });
        break;
      case 'strands':
        questions.push({
          field: f.strandDiameters,
          message: `${f.strandDiameters} give ${slip(ratio, 'the nominal area')} Strands are measured one by one, in mm.`,
        });
        break;
      case 'diameter':
        questions.push({
          field: f.diameter,
          message: `${f.diameter} gives ${slip(ratio, 'the nominal area')}`,
        });
        break;
    }
  }
  if (
    input.method === 'strands' &&
    input.claimedStrands !== undefined &&
    input.countedStrands !== undefined &&
    input.claimedStrands > 0 &&
    Math.abs(input.countedStrands - input.claimedStrands) / input.claimedStrands >
      STRAND_COUNT_TOLERANCE
  ) {
    questions.push({
      field: f.count,
      message: `${f.count} is ${input.countedStrands} strands but the product claims ${input.claimedStrands}: more than 10 % off. Recount, or confirm it.`,
    });
  }
  if (input.identification === 'inconsistent') {
    const field = input.method === 'resistance' ? f.resistance : f.mass;
    questions.push({
      field,
      message: `${field}: weight × resistance fits no conductor metal. Check the mass, the resistance and its unit (Ω or mΩ), and both lengths.`,
    });
  }
  return questions;
}
