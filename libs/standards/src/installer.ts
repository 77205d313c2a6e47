import { BELOW_SMALLEST_SIZE, type ConductorMeasuresAs } from './gauges/measures-as.js';
import type { Gauge } from './gauges/types.js';

/** What a short conductor means for the person installing it (REFERENCE §7). */
export interface InstallerConsequence {
  /** The size to treat the conductor as, or null when it meets no standard size. */
  treatAs: string | null;
  /** "Treat as 8 AWG for fusing and voltage drop …" */
  text: string;
  /** The cautions shown beside it, each naming its basis. */
  cautions: readonly string[];
}

/**
 * The installer's side of a short conductor (issue 13 point 10; REFERENCE §7): size the fuse
 * and the voltage drop for the size it measures as, not for the label. Cautions, not design
 * rules: the usual deference to codes and makers.
 */
export const SHORT_CONDUCTOR_CAUTIONS: readonly string[] = Object.freeze([
  'The fuse protects the wire, not the equipment: a fuse sized for the label may not protect this conductor. Fit it close to the battery, within about 18 in (common practice; ABYC E-11 asks 7 in on boats).',
  'Work out voltage drop with the smaller size: the run drops more than the label suggests (common practice).',
  "Always defer to local codes, the equipment maker's instructions and licensed practice.",
]);

export function installerConsequence(
  label: Gauge,
  measuresAs: ConductorMeasuresAs,
): InstallerConsequence {
  if (measuresAs.gauge === null || measuresAs.label === BELOW_SMALLEST_SIZE) {
    return {
      treatAs: null,
      text: `Meets no standard ${label.system === 'awg' ? 'AWG' : 'metric'} size: do not use it as a ${label.label} conductor; treat it as smaller than the smallest size for fusing and voltage drop.`,
      cautions: SHORT_CONDUCTOR_CAUTIONS,
    };
  }
  return {
    treatAs: measuresAs.label,
    text: `Treat as ${measuresAs.label} for fusing and voltage drop, not as the ${label.label} on the label.`,
    cautions: SHORT_CONDUCTOR_CAUTIONS,
  };
}
