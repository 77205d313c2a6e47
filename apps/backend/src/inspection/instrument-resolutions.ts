import { DomainError } from '../common/domain-error';

import type { InstrumentAccuracy } from '@gaugeproof/standards';
import type { Instrument, InstrumentKind } from '../instruments/entities/instrument.entity';
import { instrumentAccuracy, instrumentIdentity } from '../instruments/instrument-rules';
import type { InstrumentSnapshot, ReadingMethod } from './entities/reading.entity';

/** Resolutions handed to the standards library, in the method's units (g, mm, Ω, °C). */
export interface MethodResolutions {
  massResolutionG?: number;
  lengthResolutionMm?: number;
  diameterResolutionMm?: number;
  resistanceResolutionOhm?: number;
  temperatureResolutionC?: number;
  /** Each instrument's stated accuracy and certificate U, in the method's units (GUM 4.3). */
  balance?: InstrumentAccuracy;
  rule?: InstrumentAccuracy;
  micrometer?: InstrumentAccuracy;
  meter?: InstrumentAccuracy;
  thermometer?: InstrumentAccuracy;
}

/**
 * Which instruments each method uses: the first group must be present (one of its kinds),
 * the rest are optional. A length rule left out defaults to 1 mm divisions (ASTM B263),
 * a thermometer to 0.1 °C (standards library default; common practice, no source).
 */
const METHOD_INSTRUMENTS: Record<
  ReadingMethod,
  { main: InstrumentKind[]; optional: InstrumentKind[] }
> = {
  mass: { main: ['balance'], optional: ['length_rule'] },
  strands: { main: ['micrometer', 'caliper'], optional: [] },
  diameter: { main: ['micrometer', 'caliper'], optional: [] },
  resistance: { main: ['milliohm_meter'], optional: ['length_rule', 'thermometer'] },
};

const KIND_WORDS: Record<InstrumentKind, string> = {
  balance: 'balance',
  micrometer: 'micrometer',
  caliper: 'caliper',
  length_rule: 'length rule',
  milliohm_meter: 'milliohm meter',
  thermometer: 'thermometer',
};

/** Converts a resolution to the method's unit; milliohm meters may read in mΩ (÷ 1000). */
function inUnit(i: InstrumentLike, wanted: 'g' | 'mm' | 'ohm' | 'degC'): number {
  if (i.resolutionUnit === wanted) return i.resolution;
  if (wanted === 'ohm' && i.resolutionUnit === 'mohm') return i.resolution / 1000;
  throw DomainError.refused(
    `The ${KIND_WORDS[i.kind]} '${i.name}' (serial ${i.serial}) has its resolution in ${i.resolutionUnit}; expected ${wanted}. Correct it in the instrument register.`,
    'instrumentIds',
  );
}

/**
 * Checks that the instruments fit the method (the main one present, no kind twice, none
 * foreign to the method) and returns their resolutions. Throws 422 with a clerk's sentence.
 */
/** What the resolution rules read of an instrument: a register row or a reading's snapshot. */
export type InstrumentLike = Pick<
  Instrument,
  'kind' | 'name' | 'serial' | 'resolution' | 'resolutionUnit'
> &
  Partial<
    Pick<Instrument, 'accuracyPercentOfReading' | 'accuracyAbsolute' | 'calibrationUncertainty'>
  >;

/** The register's accuracy fields in the method's unit (mΩ amounts ÷ 1000 for Ω). */
function accuracyOf(i: InstrumentLike, wanted: 'g' | 'mm' | 'ohm' | 'degC'): InstrumentAccuracy {
  const scale = wanted === 'ohm' && i.resolutionUnit === 'mohm' ? 1 / 1000 : 1;
  const a: InstrumentAccuracy = {};
  if (i.accuracyPercentOfReading != null) a.accuracyPercentOfReading = i.accuracyPercentOfReading;
  if (i.accuracyAbsolute != null) a.accuracyAbsolute = i.accuracyAbsolute * scale;
  if (i.calibrationUncertainty != null) a.calibrationUncertainty = i.calibrationUncertainty * scale;
  return a;
}

export function resolutionsFor(
  method: ReadingMethod,
  instruments: readonly InstrumentLike[],
): MethodResolutions {
  const { main, optional } = METHOD_INSTRUMENTS[method];
  const problems: string[] = [];
  const byKind = new Map<InstrumentKind, InstrumentLike>();
  for (const i of instruments) {
    if (![...main, ...optional].includes(i.kind)) {
      problems.push(`a ${KIND_WORDS[i.kind]} ('${i.name}') is not used by the ${method} method`);
    } else if (byKind.has(i.kind)) {
      problems.push(`name one ${KIND_WORDS[i.kind]} only`);
    } else byKind.set(i.kind, i);
  }
  const mainFound = main.filter((k) => byKind.has(k));
  if (mainFound.length === 0) {
    problems.push(
      `the ${method} method needs a ${main.map((k) => KIND_WORDS[k]).join(' or ')} among the instruments`,
    );
  } else if (mainFound.length > 1) {
    problems.push(`name a ${main.map((k) => KIND_WORDS[k]).join(' or a ')}, not both`);
  }
  if (problems.length) {
    const text = problems.join('; ');
    throw DomainError.refused(`${text[0].toUpperCase()}${text.slice(1)}.`, 'instrumentIds');
  }
  const get = (k: InstrumentKind) => byKind.get(k);
  const r: MethodResolutions = {};
  const balance = get('balance');
  if (balance) {
    r.massResolutionG = inUnit(balance, 'g');
    r.balance = accuracyOf(balance, 'g');
  }
  const rule = get('length_rule');
  if (rule) {
    r.lengthResolutionMm = inUnit(rule, 'mm');
    r.rule = accuracyOf(rule, 'mm');
  }
  const gauge = get('micrometer') ?? get('caliper');
  if (gauge) {
    r.diameterResolutionMm = inUnit(gauge, 'mm');
    r.micrometer = accuracyOf(gauge, 'mm');
  }
  const meter = get('milliohm_meter');
  if (meter) {
    r.resistanceResolutionOhm = inUnit(meter, 'ohm');
    r.meter = accuracyOf(meter, 'ohm');
  }
  const thermometer = get('thermometer');
  if (thermometer) {
    r.temperatureResolutionC = inUnit(thermometer, 'degC');
    r.thermometer = accuracyOf(thermometer, 'degC');
  }
  return r;
}

export function snapshot(
  i: Pick<
    Instrument,
    'id' | 'kind' | 'name' | 'serial' | 'resolution' | 'resolutionUnit' | 'calibrationDueOn'
  > &
    Partial<
      Pick<Instrument, 'accuracyPercentOfReading' | 'accuracyAbsolute' | 'calibrationUncertainty'>
    >,
): InstrumentSnapshot {
  return {
    ...instrumentIdentity(i),
    calibrationDueOn: i.calibrationDueOn,
    ...instrumentAccuracy(i),
  };
}
