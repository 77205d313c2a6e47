import { DomainError } from '../common/domain-error';
import {
  areaFromDiameter,
  areaFromMass,
  areaFromResistance,
  areaFromStrands,
  assessSample,
  identifyMaterial,
  StandardsInputError,
  type AreaResult,
  type IdentifyMaterialInput,
  type MaterialId,
  type MaterialIdentification,
} from '@gaugeproof/standards';
import type { ReadingMethod, Verdict } from './entities/reading.entity';
import type { MethodResolutions } from './instrument-resolutions';

export type ReadingInputs = Partial<
  Record<
    | 'massG'
    | 'lengthMm'
    | 'count'
    | 'strandDiameterMm'
    | 'resistanceOhm'
    | 'temperatureC'
    | 'diameterMm'
    | 'strandingIncrement',
    number
  >
>;

/** Another non-voided reading of the same sample, newest first, for material identification. */
export interface SiblingReading {
  method: ReadingMethod;
  inputs: ReadingInputs;
  areaMm2: number;
}

export interface ReadingToCompute {
  method: ReadingMethod;
  inputs: ReadingInputs;
  resolutions: MethodResolutions;
  gaugeLabel: string;
  claimedMaterial: MaterialId;
  minAreaRatio: number;
  siblings: readonly SiblingReading[];
}

export interface ComputedReading {
  areaMm2: number;
  uMm2: number;
  expandedUMm2: number;
  areaRatio: number;
  measuresAs: string;
  identifiedMaterial: string | null;
  materialMismatch: boolean;
  verdict: Verdict;
  result: Record<string, unknown>;
}

const num = (v: number | undefined): number => v as number;

/** Area by the reading's method, assuming the claimed material where the method needs one. */
function area(r: ReadingToCompute): AreaResult {
  const i = r.inputs;
  switch (r.method) {
    case 'mass':
      return areaFromMass({
        massG: num(i.massG),
        lengthMm: num(i.lengthMm),
        material: r.claimedMaterial,
        strandingIncrement: i.strandingIncrement,
        massResolutionG: r.resolutions.massResolutionG,
        lengthResolutionMm: r.resolutions.lengthResolutionMm,
      });
    case 'strands':
      return areaFromStrands({
        count: num(i.count),
        strandDiameterMm: num(i.strandDiameterMm),
        diameterResolutionMm: r.resolutions.diameterResolutionMm,
      });
    case 'resistance':
      return areaFromResistance({
        resistanceOhm: num(i.resistanceOhm),
        lengthMm: num(i.lengthMm),
        temperatureC: i.temperatureC,
        material: r.claimedMaterial,
        strandingIncrement: i.strandingIncrement,
        resistanceResolutionOhm: r.resolutions.resistanceResolutionOhm,
        lengthResolutionMm: r.resolutions.lengthResolutionMm,
        temperatureResolutionC: r.resolutions.temperatureResolutionC,
      });
    case 'diameter':
      return areaFromDiameter({
        diameterMm: num(i.diameterMm),
        diameterResolutionMm: r.resolutions.diameterResolutionMm,
      });
  }
}

/**
 * Material from this reading and the sample's other live readings: needs a mass reading,
 * plus a resistance reading (mass-resistivity, rescaled to the mass specimen's length) and/or
 * a geometric area from strands or a solid diameter (apparent density). Null without mass.
 */
export function identify(all: readonly SiblingReading[]): MaterialIdentification | null {
  const mass = all.find((r) => r.method === 'mass');
  if (!mass) return null;
  const resistance = all.find((r) => r.method === 'resistance');
  const geometric = all.find((r) => r.method === 'strands' || r.method === 'diameter');
  const lengthMm = num(mass.inputs.lengthMm);
  const input: IdentifyMaterialInput = {
    massG: num(mass.inputs.massG),
    lengthMm,
    strandingIncrement: mass.inputs.strandingIncrement,
  };
  if (resistance) {
    // R grows with length: the resistance over the mass specimen's length.
    input.resistanceOhm =
      (num(resistance.inputs.resistanceOhm) * lengthMm) / num(resistance.inputs.lengthMm);
    input.temperatureC = resistance.inputs.temperatureC;
  }
  if (geometric) input.geometricAreaMm2 = geometric.areaMm2;
  return identifyMaterial(input);
}

/** Everything stored with a reading, recomputed on the server with the standards library. */
export function computeReading(r: ReadingToCompute): ComputedReading {
  try {
    const a = area(r);
    const identification = identify([
      { method: r.method, inputs: r.inputs, areaMm2: a.areaMm2 },
      ...r.siblings,
    ]);
    const assessment = assessSample({
      gauge: r.gaugeLabel,
      claimedMaterial: r.claimedMaterial,
      areaMm2: a.areaMm2,
      UMm2: a.UMm2,
      identifiedMaterial: identification?.material,
      minAreaRatio: r.minAreaRatio,
      sampleLengthMm: r.inputs.lengthMm,
    });
    return {
      areaMm2: a.areaMm2,
      uMm2: a.uMm2,
      expandedUMm2: a.UMm2,
      areaRatio: assessment.areaRatio,
      measuresAs: assessment.measuresAs.label,
      identifiedMaterial: identification?.material ?? null,
      materialMismatch: assessment.materialCheck === 'not_as_claimed',
      verdict: assessment.verdict,
      result: {
        budget: a.budget,
        coverageFactor: a.coverageFactor,
        note: a.note,
        reasons: assessment.reasons,
        lengthForConclusiveMm: assessment.lengthForConclusiveMm ?? null,
        minimumAreaMm2: assessment.minimumAreaMm2,
        largestSizeReached: assessment.measuresAs.label,
        materialCheck: assessment.materialCheck,
        identification,
      },
    };
  } catch (e) {
    if (e instanceof StandardsInputError) {
      throw DomainError.invalid([{ field: e.field, message: e.message }]);
    }
    throw e;
  }
}
