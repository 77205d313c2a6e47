import { StandardsInputError } from '../errors.js';
import { requireInteger, requireOneOf } from '../validate.js';
import {
  AQLS,
  CODE_LETTER_TABLE,
  INSPECTION_LEVELS,
  PLAN_TABLE,
  SEVERITIES,
  type Aql,
  type CodeLetter,
  type InspectionLevel,
  type Severity,
} from './tables.js';

export interface SamplingPlanInput {
  /** Units in the lot; at least 1 (a lot of one takes Table I's first row, see codeLetterFor). */
  lotSize: number;
  level?: InspectionLevel;
  /** AQL in percent, as written in the tables ('1.0') or as a number (1). */
  aql?: Aql | number;
  severity?: Severity;
}

export interface SamplingPlan {
  lotSize: number;
  level: InspectionLevel;
  aql: Aql;
  severity: Severity;
  /** Sample-size code letter from Table I (the arrows may lead to another letter's plan). */
  codeLetter: CodeLetter;
  /** Units to inspect: the plan's n, capped at the lot size. */
  sampleSize: number;
  /** The plan's n before capping. */
  planSampleSize: number;
  /** Accept the lot when the nonconforming count is at most this (Ac). */
  accept: number;
  /** Reject the lot when the nonconforming count is at least this (Re). */
  reject: number;
  /** True when the plan's sample reaches the lot size: inspect every unit (INSPECT_ALL_RULE). */
  inspectAll: boolean;
}

/**
 * The rule applied when a plan's sample size equals or exceeds the lot size (ANSI/ASQ Z1.4;
 * ISO 2859-1; the note of the tables' JSON): printed beside every plan that inspects all.
 */
export const INSPECT_ALL_RULE =
  'ANSI/ASQ Z1.4 / ISO 2859-1: when the sample size equals or exceeds the lot size, inspect every unit (100 % inspection).';

/**
 * A lot of one unit (a single drum): Table I starts at 2, so it takes the first row (2 to 8);
 * every plan of that row has n ≥ 2, so INSPECT_ALL_RULE applies and the one unit is the sample.
 * (Our reading of the tables: Table I has no row below 2; the rule above decides the sample.)
 */
export const SMALLEST_TABLE_I_LOT = 2;

/** The AQL key of the tables for '1.0', '1', 1 or 0.65; StandardsInputError('aql') if none. */
export function aqlKey(aql: unknown): Aql {
  const value = typeof aql === 'number' ? aql : typeof aql === 'string' ? Number(aql.trim()) : NaN;
  const key = Number.isFinite(value) ? AQLS.find((a) => Number(a) === value) : undefined;
  if (key === undefined) {
    throw new StandardsInputError(
      'aql',
      `AQL ${String(aql)} is not in the tables (${AQLS.join(', ')}).`,
    );
  }
  return key;
}

/** Sample-size code letter from lot size and inspection level (Table I, MIL-STD-105E). */
export function codeLetterFor(lotSize: number, level: InspectionLevel = 'II'): CodeLetter {
  const n = Math.max(requireInteger('lotSize', lotSize, 1), SMALLEST_TABLE_I_LOT);
  const levelIndex = INSPECTION_LEVELS.indexOf(requireOneOf('level', level, INSPECTION_LEVELS));
  const row = CODE_LETTER_TABLE.find(([min, max]) => n >= min && (max === null || n <= max));
  if (row === undefined)
    throw new StandardsInputError('lotSize', `No Table I row for lot size ${n}.`);
  return row[2][levelIndex];
}

/**
 * The single sampling plan for a lot (MIL-STD-105E Tables I, II-A/B/C; ANSI/ASQ Z1.4):
 * code letter from Table I, then the plan at the AQL with the table's arrows followed.
 * When the plan's n reaches the lot size every unit is inspected (`inspectAll`,
 * INSPECT_ALL_RULE), judged with the same Ac and Re. Counting nonconforming units (AQL 10 or
 * below), a reject number beyond the units inspected could never be reached, so it is brought
 * down to the sample, and Ac below it: only a lot of one meets this (checked over every lot
 * from 2 to 3 300 and every level, AQL and severity: no other plan changes), and its one unit,
 * found nonconforming, rejects it (MIL-STD-105E 6.4, the right to reject any nonconforming unit
 * found; from memory).
 */
export function samplingPlan(input: SamplingPlanInput): SamplingPlan {
  const lotSize = requireInteger('lotSize', input.lotSize, 1);
  const level = requireOneOf('level', input.level ?? 'II', INSPECTION_LEVELS);
  const aql = aqlKey(input.aql ?? '1.0');
  const severity = requireOneOf('severity', input.severity ?? 'normal', SEVERITIES);
  const codeLetter = codeLetterFor(lotSize, level);
  const [n, ac, re] = PLAN_TABLE[severity][codeLetter][AQLS.indexOf(aql)];
  const sampleSize = Math.min(n, lotSize);
  const countsUnits = Number(aql) <= MAX_AQL_NONCONFORMING_UNITS;
  const reject = countsUnits ? Math.min(re, sampleSize) : re;
  const accept = countsUnits ? Math.min(ac, reject - 1) : ac;
  return {
    lotSize,
    level,
    aql,
    severity,
    codeLetter,
    sampleSize,
    planSampleSize: n,
    accept,
    reject,
    inspectAll: n >= lotSize,
  };
}

export type LotOutcome = 'accept' | 'reject' | 'accept_and_return_to_normal';

/**
 * The lot's fate from the count of nonconforming units in the sample: accept at Ac or
 * fewer, reject at Re or more; on reduced inspection a count between them accepts the lot
 * but returns the stream to normal inspection (MIL-STD-105E; the JSON's notes).
 */
export function lotOutcome(plan: SamplingPlan, nonconformingCount: number): LotOutcome {
  if (
    typeof plan !== 'object' ||
    plan === null ||
    !Number.isInteger(plan.accept) ||
    !Number.isInteger(plan.reject)
  ) {
    throw new StandardsInputError('plan', 'plan must come from samplingPlan().');
  }
  const count = requireInteger('nonconformingCount', nonconformingCount, 0);
  if (count > plan.sampleSize) {
    throw new StandardsInputError(
      'nonconformingCount',
      `${count} nonconforming units cannot come from a sample of ${plan.sampleSize}.`,
    );
  }
  if (count <= plan.accept) return 'accept';
  if (count >= plan.reject) return 'reject';
  return 'accept_and_return_to_normal';
}

/**
 * Would the lot also be accepted with the AQL one step tighter (the normal plan of the same
 * code letter at the next smaller AQL)? Used by the switching score. False at the tightest AQL.
 */
export function acceptedAtTighterAql(plan: SamplingPlan, nonconformingCount: number): boolean {
  const index = AQLS.indexOf(aqlKey(plan.aql));
  if (index === 0) return false;
  const count = requireInteger('nonconformingCount', nonconformingCount, 0);
  return count <= PLAN_TABLE.normal[plan.codeLetter][index - 1][1];
}

/**
 * How a sampling plan is named wherever it is printed (issue 13 point 8): the single
 * sampling tables of ANSI/ASQ Z1.4 (the same as MIL-STD-105E), switching per ISO 2859-1.
 */
export const SAMPLING_PLAN_NAME =
  'ANSI/ASQ Z1.4 / MIL-STD-105E single sampling; switching per ISO 2859-1';

/**
 * The largest AQL for a plan that counts nonconforming units: 10. ANSI/ASQ Z1.4 and ISO 2859-1
 * give AQLs above 10 for nonconformities per 100 units only (a percentage of units cannot
 * exceed 100, and their plans accept more "defects" than units).
 */
export const MAX_AQL_NONCONFORMING_UNITS = 10;

/** `StandardsInputError('aql')` when the AQL is above 10, with the reason (Z1.4; ISO 2859-1). */
export function requireAqlForNonconformingUnits(aql: unknown): Aql {
  const key = aqlKey(aql);
  if (Number(key) > MAX_AQL_NONCONFORMING_UNITS) {
    throw new StandardsInputError(
      'aql',
      `AQL ${key} is for nonconformities per 100 units; a plan that counts nonconforming units takes AQL 10 or below (ANSI/ASQ Z1.4; ISO 2859-1).`,
    );
  }
  return key;
}

/** Where a lot stands while its sample is inspected. */
export type SampleProgress = 'in_progress' | LotOutcome;

/**
 * Curtailed rejection (issue 13 point 5): once the nonconforming count reaches the reject
 * number the lot can be rejected at once, whatever the units still to inspect (more
 * nonconforming units cannot undo it); acceptance still needs every planned unit.
 * `inspectedUnits` is the count of units with a verdict, `nonconformingUnits` of those
 * nonconforming (a kit with one short conductor is one nonconforming unit).
 */
export function sampleProgress(
  plan: SamplingPlan,
  inspectedUnits: number,
  nonconformingUnits: number,
): SampleProgress {
  const inspected = requireInteger('inspectedUnits', inspectedUnits, 0);
  const count = requireInteger('nonconformingUnits', nonconformingUnits, 0);
  if (count > inspected) {
    throw new StandardsInputError(
      'nonconformingUnits',
      `${count} nonconforming units cannot come from ${inspected} inspected.`,
    );
  }
  if (count >= plan.reject) return 'reject';
  if (inspected < plan.sampleSize) return 'in_progress';
  return lotOutcome(plan, count);
}
