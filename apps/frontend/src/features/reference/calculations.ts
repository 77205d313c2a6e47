import {
  StandardsInputError,
  cmilToMm2,
  areaFromMass,
  areaFromResistance,
  areaFromStrands,
  assessSample,
  conductorMeasuresAs,
  parseGauge,
  voltageDrop,
  type AreaResult,
  type Gauge,
  type MaterialId,
  type VoltageDrop,
} from '@gaugeproof/standards';
import { massToG, runLengthToMm, shortLengthToMm, type UnitSystem } from '@/lib/units';
import { parseDecimal } from '@gaugeproof/api-types';

/**
 * The calculators of the Reference screen: thin wrappers over @gaugeproof/standards that
 * turn typed text into numbers and the library's input errors into messages by field.
 */

/**
 * Nominal voltage of a 12 V vehicle system: a charged lead-acid battery at rest reads
 * about 12.6 V (common practice, no source). Percent drops are of this voltage.
 */
export const NOMINAL_SYSTEM_V = 12.6;

export type Calc<T> = { ok: true; value: T } | { ok: false; field: string; message: string };

/**
 * A typed number: '' is missing, anything else must be a plain decimal as the contract's
 * parseDecimal reads it ('2,5' reads 2.5; '0x10' is no number), as in the reading form.
 */
export function readNumber(field: string, text: string): number {
  if (text.trim() === '') throw new StandardsInputError(field, 'Enter a value.');
  const n = parseDecimal(text);
  if (n === null) throw new StandardsInputError(field, 'Enter a number.');
  return n;
}

function attempt<T>(compute: () => T): Calc<T> {
  try {
    return { ok: true, value: compute() };
  } catch (error) {
    if (error instanceof StandardsInputError) {
      return { ok: false, field: error.field, message: error.message };
    }
    throw error;
  }
}

export interface AreaOutcome {
  result: AreaResult;
  /**
   * The one "measures as" of issue 13, as on the Lot page, CSV and evidence pack: the largest
   * standard size the conductor meets (AWG: 98 % of its nominal area, ASTM B496; metric
   * copper: IEC 60228's maximum resistance at 20 °C, class 5), or "below the smallest size".
   */
  measuresAs: string;
  /** Present when a label was chosen: measured area ÷ that label's nominal area. */
  compare: { gauge: Gauge; ratio: number } | null;
}

function outcome(result: AreaResult, compareLabel: string, material: MaterialId): AreaOutcome {
  const gauge = compareLabel.trim() === '' ? null : parseGauge(compareLabel);
  // Against a label, the verdict's own rule (assessSample) names the size; without one, the
  // AWG area rule.
  const measures = gauge
    ? assessSample({
        gauge,
        claimedMaterial: material,
        areaMm2: result.areaMm2,
        UMm2: result.UMm2,
      }).measuresAs.label
    : conductorMeasuresAs({ system: 'awg', areaMm2: result.areaMm2 }).label;
  return {
    result,
    measuresAs: measures,
    compare: gauge ? { gauge, ratio: result.areaMm2 / gauge.nominalAreaMm2 } : null,
  };
}

/** Several readings typed in one field, separated by spaces or semicolons. */
export function readNumbers(field: string, text: string): number[] {
  const parts = text.split(/[\s;]+/).filter((p) => p !== '');
  if (parts.length === 0) throw new StandardsInputError(field, 'Enter at least one value.');
  return parts.map((p) => readNumber(field, p));
}

/** Text fields in the units of the preference (mm or in, g or lb, m or ft, mm² or cmil). */
interface Typed {
  system: UnitSystem;
}

export interface MassCalcInput extends Typed {
  mass: string;
  length: string;
  material: MaterialId;
  strandingIncrementPercent: string;
  compareLabel: string;
}

export const calcAreaFromMass = (input: MassCalcInput): Calc<AreaOutcome> =>
  attempt(() =>
    outcome(
      areaFromMass({
        massG: massToG(input.system, readNumber('massG', input.mass)),
        lengthMm: shortLengthToMm(input.system, readNumber('lengthMm', input.length)),
        material: input.material,
        strandingIncrement: readNumber('strandingIncrement', input.strandingIncrementPercent) / 100,
      }),
      input.compareLabel,
      input.material,
    ),
  );

export interface StrandsCalcInput extends Typed {
  count: string;
  /** One or more strand diameters (mm or in). */
  strandDiameters: string;
  compareLabel: string;
}

export const calcAreaFromStrands = (input: StrandsCalcInput): Calc<AreaOutcome> =>
  attempt(() =>
    outcome(
      areaFromStrands({
        count: readNumber('count', input.count),
        strandDiameterMm: readNumbers('strandDiameterMm', input.strandDiameters).map((d) =>
          shortLengthToMm(input.system, d),
        ),
      }),
      input.compareLabel,
      // Strands give the geometric area; a metric label is judged as plain copper.
      'copper',
    ),
  );

export interface ResistanceCalcInput extends Typed {
  /** Four-wire reading of the specimen, mΩ. */
  resistanceMilliOhm: string;
  length: string;
  temperatureC: string;
  material: MaterialId;
  strandingIncrementPercent: string;
  compareLabel: string;
}

export const calcAreaFromResistance = (input: ResistanceCalcInput): Calc<AreaOutcome> =>
  attempt(() =>
    outcome(
      areaFromResistance({
        resistanceOhm: readNumber('resistanceOhm', input.resistanceMilliOhm) / 1000,
        lengthMm: shortLengthToMm(input.system, readNumber('lengthMm', input.length)),
        temperatureC: readNumber('temperatureC', input.temperatureC),
        material: input.material,
        strandingIncrement: readNumber('strandingIncrement', input.strandingIncrementPercent) / 100,
      }),
      input.compareLabel,
      input.material,
    ),
  );

export interface DropCalcInput extends Typed {
  /** The label the cable is sold as; its nominal copper area is the "labelled" case. */
  label: string;
  /** The measured area (mm² or cmil); empty for no comparison. */
  measuredArea: string;
  measuredMaterial: MaterialId;
  /** One-way lengths (m or ft); the circuit is power plus ground (REFERENCE §7). */
  powerLength: string;
  groundLength: string;
  currentA: string;
  temperatureC: string;
}

export interface DropSide extends VoltageDrop {
  areaMm2: number;
  material: MaterialId;
  /** Drop as a fraction of NOMINAL_SYSTEM_V. */
  fraction: number;
}

export interface DropOutcome {
  gauge: Gauge;
  circuitLengthM: number;
  labelled: DropSide;
  measured: DropSide | null;
}

export const calcVoltageDrop = (input: DropCalcInput): Calc<DropOutcome> =>
  attempt(() => {
    const gauge = parseGauge(input.label);
    const lengthM = (field: string, text: string) =>
      runLengthToMm(input.system, readNumber(field, text)) / 1000;
    const power = lengthM('powerLength', input.powerLength);
    const ground = lengthM('groundLength', input.groundLength);
    if (power < 0 || ground < 0) {
      throw new StandardsInputError(
        power < 0 ? 'powerLength' : 'groundLength',
        'A length cannot be negative.',
      );
    }
    const common = {
      circuitLengthM: power + ground,
      currentA: readNumber('currentA', input.currentA),
      temperatureC: readNumber('temperatureC', input.temperatureC),
    };
    const side = (areaMm2: number, material: MaterialId): DropSide => {
      const drop = voltageDrop({ ...common, areaMm2, material });
      return { ...drop, areaMm2, material, fraction: drop.volts / NOMINAL_SYSTEM_V };
    };
    const typed = input.measuredArea.trim();
    const measuredAreaMm2 =
      typed === ''
        ? null
        : input.system === 'imperial'
          ? cmilToMm2(readNumber('measuredArea', typed))
          : readNumber('measuredArea', typed);
    return {
      gauge,
      circuitLengthM: common.circuitLengthM,
      labelled: side(gauge.nominalAreaMm2, 'copper'),
      measured: measuredAreaMm2 === null ? null : side(measuredAreaMm2, input.measuredMaterial),
    };
  });
