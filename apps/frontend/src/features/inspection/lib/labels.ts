import type {
  ClaimedMaterial,
  Conductor,
  IdentifiedMaterial,
  Reading,
  ReadingMethod,
  SampleVerdict,
} from '@/features/inspection/types';
import { claimedMaterialLabels, conductorPurposeLabels, inSentence } from '@/lib/labels';

/** The claimed material inside a sentence ("Sold as copper"). */
export const claimedMaterialText = (material: ClaimedMaterial): string =>
  inSentence(claimedMaterialLabels[material]);

export const identifiedLabels: Record<IdentifiedMaterial, string> = {
  copper: 'copper',
  cca: 'copper-clad aluminium (CCA)',
  aluminium: 'aluminium',
  inconsistent: 'inconsistent readings',
  unknown: 'not identified',
};

export const methodLabels: Record<ReadingMethod, string> = {
  mass: 'Mass',
  strands: 'Strands',
  resistance: 'Resistance',
  diameter: 'Diameter',
};

export const verdictLabels: Record<SampleVerdict, string> = {
  conforms: 'Conforms',
  nonconforming: 'Nonconforming',
  inconclusive: 'Inconclusive',
  untested: 'Untested',
};

export const verdictColours: Record<SampleVerdict, 'success' | 'error' | 'warning' | 'default'> = {
  conforms: 'success',
  nonconforming: 'error',
  inconclusive: 'warning',
  untested: 'default',
};

export const conductorLabel = (c: Conductor): string =>
  `${conductorPurposeLabels[c.purpose]} ${c.gauge}`;

const COPPER: readonly ClaimedMaterial[] = ['copper', 'tinned_copper'];
export const isCopperClaim = (material: ClaimedMaterial): boolean => COPPER.includes(material);

/** The reading that speaks for a sample now: the latest one not voided. */
export function currentReading(readings: readonly Reading[]): Reading | undefined {
  return [...readings].reverse().find((r) => !r.voided);
}

/** True when the readings show less area than the policy minimum, or a metal other than copper. */
export function needsCaution(
  conductor: Conductor,
  minAreaRatio: number,
  readings: readonly Reading[],
): {
  undersized: boolean;
  notCopper: boolean;
} {
  const live = readings.filter((r) => !r.voided);
  return {
    undersized: live.some((r) => r.areaRatio < minAreaRatio),
    notCopper:
      !isCopperClaim(conductor.claimedMaterial) ||
      live.some(
        (r) =>
          r.materialMismatch ||
          r.identifiedMaterial === 'cca' ||
          r.identifiedMaterial === 'aluminium',
      ),
  };
}
