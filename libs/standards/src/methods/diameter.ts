import { circleAreaMm2 } from '../units.js';
import {
  areaResult,
  instrumentComponents,
  type AreaResult,
  type InstrumentAccuracy,
} from '../uncertainty.js';
import { checkAccuracy, reading, spreadComponent } from './common.js';

export interface AreaFromDiameterInput {
  /** Diameter of a solid conductor, mm: one reading or several (e.g. at right angles). */
  diameterMm: number | readonly number[];
  /** Micrometer resolution, mm. Default 0.001 mm (as for strands, issue 3). */
  diameterResolutionMm?: number;
  /** The micrometer's stated accuracy and calibration, mm (instrument register). */
  micrometer?: InstrumentAccuracy;
}

/**
 * Cross-section of a solid, round conductor: A = π d² / 4. Not for stranded cable: a
 * bundle's outside diameter is a screen only (a 7-strand bundle measures about 13 % over
 * the solid diameter; common practice, REFERENCE §3), so the server refuses it there.
 */
export function areaFromDiameter(input: AreaFromDiameterInput): AreaResult {
  const resolution = input.diameterResolutionMm ?? 0.001;
  const d = reading('diameterMm', input.diameterMm, 'diameterResolutionMm', resolution);
  const micrometer = checkAccuracy('micrometer', input.micrometer);
  const name = d.count > 1 ? `diameter (mean of ${d.count})` : 'diameter';
  return areaResult(
    circleAreaMm2(d.value),
    [
      ...instrumentComponents(name, d.value, 'mm', 2, resolution, micrometer, {
        resolutionNote: 'micrometer resolution',
      }),
      ...spreadComponent('spread of diameter readings', d, 'mm', 2),
    ],
    'No conventional constants enter (π only); the micrometer readings carry the uncertainty. Assumes a round, solid conductor.',
  );
}
