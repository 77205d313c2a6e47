import { DomainError } from '../common/domain-error';
import {
  areaFromDiameter,
  areaFromMass,
  areaFromResistance,
  areaFromStrands,
  assessSample,
  identifyMaterial,
  parseGauge,
  questionReading,
  StandardsInputError,
  type AreaResult,
  type ConductorClass,
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
> & {
  /** Strand diameters, mm, one per strand measured (1 to 10). */
  strandDiametersMm?: number[];
};

/** Another non-voided reading of the same sample, newest first, for material identification. */
export interface SiblingReading {
  method: ReadingMethod;
  inputs: ReadingInputs;
  areaMm2: number;
  /** Resistance readings: false for two-wire, which never identifies the metal. */
  fourWire?: boolean | null;
}

/** What a reading's verdict needs of its conductor spec and product. */
export interface ConductorContext {
  gaugeLabel: string;
  claimedMaterial: MaterialId;
  minAreaRatio: number;
  /** IEC 60228 class of a metric conductor (null for AWG: default 5 if metric). */
  conductorClass?: number | null;
  /** The strand count the product claims, if any. */
  claimedStrands?: number | null;
}

export interface ReadingToCompute extends ConductorContext {
  method: ReadingMethod;
  inputs: ReadingInputs;
  resolutions: MethodResolutions;
  siblings: readonly SiblingReading[];
  /** Resistance readings: four-wire (default) or two-wire. */
  fourWire?: boolean | null;
  /**
   * Present for a reading being entered (not a recompute): its plausibility is checked and a
   * questioned one refused unless confirmed; a stranded conductor's overall diameter refused.
   */
  entry?: { confirmUnusual: boolean };
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

/** The strand diameters of a strands reading: the list, or the single legacy value. */
export function strandDiameters(i: ReadingInputs): number[] {
  if (i.strandDiametersMm && i.strandDiametersMm.length) return i.strandDiametersMm;
  return i.strandDiameterMm === undefined ? [] : [i.strandDiameterMm];
}

/**
 * Area by the reading's method, assuming the claimed material where the method needs one,
 * with every instrument's resolution, stated accuracy and calibration (GUM 4.3). `scale`
 * runs the method on a specimen `scale` times as long (same cable): the length advice.
 */
function area(r: ReadingToCompute, scale = 1): AreaResult {
  const i = r.inputs;
  const res = r.resolutions;
  switch (r.method) {
    case 'mass':
      return areaFromMass({
        massG: num(i.massG) * scale,
        lengthMm: num(i.lengthMm) * scale,
        material: r.claimedMaterial,
        strandingIncrement: i.strandingIncrement,
        massResolutionG: res.massResolutionG,
        lengthResolutionMm: res.lengthResolutionMm,
        balance: res.balance,
        rule: res.rule,
      });
    case 'strands':
      return areaFromStrands({
        count: num(i.count),
        strandDiameterMm: strandDiameters(i),
        diameterResolutionMm: res.diameterResolutionMm,
        micrometer: res.micrometer,
      });
    case 'resistance':
      return areaFromResistance({
        resistanceOhm: num(i.resistanceOhm) * scale,
        lengthMm: num(i.lengthMm) * scale,
        temperatureC: i.temperatureC,
        material: r.claimedMaterial,
        strandingIncrement: i.strandingIncrement,
        resistanceResolutionOhm: res.resistanceResolutionOhm,
        lengthResolutionMm: res.lengthResolutionMm,
        temperatureResolutionC: res.temperatureResolutionC,
        meter: res.meter,
        rule: res.rule,
        thermometer: res.thermometer,
      });
    case 'diameter':
      return areaFromDiameter({
        diameterMm: num(i.diameterMm),
        diameterResolutionMm: res.diameterResolutionMm,
        micrometer: res.micrometer,
      });
  }
}

/**
 * Material from this reading and the sample's other live readings: needs a mass reading,
 * plus a four-wire resistance reading (mass-resistivity, rescaled to the mass specimen's
 * length) and/or a geometric area from strands or a solid diameter (apparent density).
 * Null without mass. A two-wire reading never identifies the metal (REFERENCE §4).
 */
export function identify(all: readonly SiblingReading[]): MaterialIdentification | null {
  const mass = all.find((r) => r.method === 'mass');
  if (!mass) return null;
  const resistance = all.find((r) => r.method === 'resistance' && r.fourWire !== false);
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
  if (geometric) {
    input.geometricAreaMm2 = geometric.areaMm2;
    // A solid conductor's diameter has no stranding; strands are counted per strand, so the
    // mass specimen's own increment applies to both (REFERENCE §3).
  }
  return identifyMaterial(input);
}

/** 422 for the overall diameter of a stranded conductor (issue 13: it is a screen only). */
function refuseStrandedDiameter(r: ReadingToCompute): void {
  if (r.method === 'diameter' && (r.claimedStrands ?? 1) > 1) {
    throw DomainError.refused(
      `diameterMm: the conductor is stranded (${r.claimedStrands} strands claimed), and the overall diameter of a bundle is not its metal (it measures well over the solid size). Weigh a specimen (mass) or count and measure the strands (strands) instead.`,
      'diameterMm',
    );
  }
}

/** Everything stored with a reading, recomputed on the server with the standards library. */
export function computeReading(r: ReadingToCompute): ComputedReading {
  try {
    if (r.entry) refuseStrandedDiameter(r);
    const a = area(r);
    const identification = identify([
      { method: r.method, inputs: r.inputs, areaMm2: a.areaMm2, fourWire: r.fourWire },
      ...r.siblings,
    ]);
    const gauge = parseGauge(r.gaugeLabel);
    const questions = questionReading({
      method: r.method,
      nominalAreaMm2: gauge.nominalAreaMm2,
      areaMm2: a.areaMm2,
      claimedStrands: r.claimedStrands ?? undefined,
      countedStrands: r.method === 'strands' ? r.inputs.count : undefined,
      identification: identification?.material,
      fields: { strandDiameters: 'strandDiametersMm' },
    });
    if (r.entry && questions.length && !r.entry.confirmUnusual) {
      // Each question on its field (errors), the last one saying how to go on; the
      // `questions` list stays beside it for the form's "Record it anyway".
      const last = questions.length - 1;
      throw DomainError.refusedAll(
        questions.map((q, i) => ({
          field: q.field,
          message:
            i === last
              ? `${q.message} Nothing was saved: correct the reading, or send it again with confirmUnusual: true if it is right.`
              : q.message,
        })),
        { questions },
      );
    }
    const scalable = r.method === 'mass' || r.method === 'resistance';
    const lengthMm = r.inputs.lengthMm;
    const assessment = assessSample({
      gauge,
      claimedMaterial: r.claimedMaterial,
      areaMm2: a.areaMm2,
      UMm2: a.UMm2,
      identifiedMaterial: identification?.material,
      identifiedGrade: identification?.closestGrade,
      minAreaRatio: r.minAreaRatio,
      conductorClass:
        gauge.system === 'metric' ? ((r.conductorClass ?? 5) as ConductorClass) : undefined,
      strandingIncrement: scalable ? r.inputs.strandingIncrement : undefined,
      method: r.method,
      fourWire: r.method === 'resistance' ? r.fourWire !== false : undefined,
      sampleLengthMm: lengthMm,
      uncertaintyAtLength: scalable && lengthMm ? (l) => area(r, l / lengthMm).UMm2 : undefined,
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
        effectiveDegreesOfFreedom: a.effectiveDegreesOfFreedom,
        note: a.note,
        reasons: assessment.reasons,
        criterion: assessment.criterion,
        resistanceOhmPerKm: assessment.resistanceOhmPerKm ?? null,
        UResistanceOhmPerKm: assessment.UResistanceOhmPerKm ?? null,
        limit: assessment.limit ?? null,
        lengthForConclusiveMm: assessment.lengthForConclusiveMm ?? null,
        lengthAdvice: assessment.lengthAdvice ?? null,
        minimumAreaMm2: assessment.minimumAreaMm2,
        largestSizeReached: assessment.measuresAs.label,
        consequence: assessment.consequence ?? null,
        materialCheck: assessment.materialCheck,
        identification,
        // The plausibility questions this reading raises (issue 13); a reading stored with any
        // was confirmed by the clerk (`confirmedUnusual`).
        unusual: questions.length ? questions : null,
      },
    };
  } catch (e) {
    if (e instanceof StandardsInputError) {
      throw DomainError.invalid([{ field: e.field, message: e.message }]);
    }
    throw e;
  }
}

/** Resistance readings are four-wire unless the clerk says otherwise; null for other methods. */
export const fourWireOf = (r: {
  method: ReadingMethod;
  fourWire?: boolean | null;
}): boolean | null => (r.method === 'resistance' ? r.fourWire !== false : null);
