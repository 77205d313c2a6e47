import {
  areaFromDiameter,
  areaFromMass,
  areaFromResistance,
  areaFromStrands,
  assessSample,
  StandardsInputError,
  type AreaResult,
  type SampleAssessment,
} from '@gaugeproof/standards';
import type { MethodDefinition, ResolutionSlot } from '@/features/inspection/lib/reading-methods';
import type { TypedInputs } from '@/features/inspection/lib/reading-form';
import type { ClaimedMaterial } from '@/features/inspection/types';

export interface PreviewInput {
  definition: MethodDefinition;
  /** In request units (readingInputs). */
  inputs: TypedInputs;
  resolutions: Partial<Record<ResolutionSlot, number>>;
  gauge: string;
  claimedMaterial: ClaimedMaterial;
  minAreaRatio: number;
}

export type ReadingPreview =
  | { ok: true; area: AreaResult; assessment: SampleAssessment }
  | { ok: false; field: string; message: string };

/** One typed number, or NaN (the library's "not typed" message) when absent or a list. */
const one = (x: number | number[] | undefined): number => (typeof x === 'number' ? x : NaN);

function area(input: PreviewInput): AreaResult {
  const i = input.inputs;
  const v = {
    massG: one(i.massG),
    lengthMm: one(i.lengthMm),
    count: one(i.count),
    resistanceOhm: one(i.resistanceOhm),
    temperatureC: typeof i.temperatureC === 'number' ? i.temperatureC : undefined,
    diameterMm: one(i.diameterMm),
  };
  const r = input.resolutions;
  // The library throws on a missing value, so `?? NaN` turns "not typed" into its message.
  switch (input.definition.method) {
    case 'mass':
      return areaFromMass({
        massG: v.massG ?? NaN,
        lengthMm: v.lengthMm ?? NaN,
        material: input.claimedMaterial,
        massResolutionG: r.massResolutionG,
        lengthResolutionMm: r.lengthResolutionMm,
      });
    case 'strands':
      return areaFromStrands({
        count: v.count ?? NaN,
        strandDiameterMm: i.strandDiameterMm ?? NaN,
        diameterResolutionMm: r.diameterResolutionMm,
      });
    case 'resistance':
      return areaFromResistance({
        resistanceOhm: v.resistanceOhm ?? NaN,
        lengthMm: v.lengthMm ?? NaN,
        temperatureC: v.temperatureC,
        resistanceResolutionOhm: r.resistanceResolutionOhm,
        lengthResolutionMm: r.lengthResolutionMm,
        temperatureResolutionC: r.temperatureResolutionC,
      });
    case 'diameter':
      return areaFromDiameter({
        diameterMm: v.diameterMm ?? NaN,
        diameterResolutionMm: r.diameterResolutionMm,
      });
  }
}

/**
 * The live result while the clerk types, with the same library the server uses. A preview
 * only: the server recomputes from the stored inputs and its instrument register, and may
 * identify the material from a second method, which this preview does not.
 */
export function previewReading(input: PreviewInput): ReadingPreview {
  try {
    const result = area(input);
    const assessment = assessSample({
      gauge: input.gauge,
      claimedMaterial: input.claimedMaterial,
      areaMm2: result.areaMm2,
      UMm2: result.UMm2,
      minAreaRatio: input.minAreaRatio,
      method: input.definition.method,
      sampleLengthMm: typeof input.inputs.lengthMm === 'number' ? input.inputs.lengthMm : undefined,
    });
    return { ok: true, area: result, assessment };
  } catch (error) {
    if (error instanceof StandardsInputError)
      return { ok: false, field: error.field, message: error.message };
    throw error;
  }
}
