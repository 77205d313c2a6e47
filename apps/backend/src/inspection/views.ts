import type { InstrumentSnapshot, Reading } from './entities/reading.entity';
import type { Sample } from './entities/sample.entity';
import { sampleVerdict } from './lot-evaluation';

const person = (u: { id: number; name: string } | null) => (u ? { id: u.id, name: u.name } : null);

/** A reading as stored: an entity, or the row the SQL writer has just written. */
export interface ReadingFacts extends Pick<
  Reading,
  | 'id'
  | 'method'
  | 'inputs'
  | 'instruments'
  | 'areaMm2'
  | 'uMm2'
  | 'expandedUMm2'
  | 'areaRatio'
  | 'measuresAs'
  | 'identifiedMaterial'
  | 'materialMismatch'
  | 'verdict'
  | 'result'
  | 'takenAt'
  | 'voided'
  | 'voidReason'
  | 'voidedAt'
  | 'fourWire'
  | 'confirmedUnusual'
> {
  sampleId: number;
  takenBy: { id: number; name: string } | null;
  voidedBy: { id: number; name: string } | null;
}

/** Reading as docs/api-conventions.md describes it. */
export function readingView(r: Reading) {
  return readingFactsView({
    ...r,
    id: r.id,
    sampleId: r.sample.id,
    takenBy: r.takenBy,
    voidedBy: r.voidedBy,
  });
}

export function readingFactsView(r: ReadingFacts) {
  const result = r.result as {
    reasons?: string[];
    lengthForConclusiveMm?: number | null;
    lengthAdvice?: string | null;
    budget?: unknown[];
    coverageFactor?: number;
    effectiveDegreesOfFreedom?: number | null;
    note?: string;
    identification?: unknown;
    criterion?: 'area' | 'resistance';
    resistanceOhmPerKm?: number | null;
    UResistanceOhmPerKm?: number | null;
    limit?: unknown;
    consequence?: unknown;
    unusual?: unknown[] | null;
  };
  return {
    id: r.id,
    sampleId: r.sampleId,
    method: r.method,
    inputs: r.inputs,
    instruments: r.instruments as InstrumentSnapshot[],
    areaMm2: r.areaMm2,
    uMm2: r.uMm2,
    UMm2: r.expandedUMm2,
    areaRatio: r.areaRatio,
    measuresAs: r.measuresAs,
    identifiedMaterial: r.identifiedMaterial,
    materialMismatch: r.materialMismatch,
    verdict: r.verdict,
    reasons: result.reasons ?? [],
    lengthForConclusiveMm: result.lengthForConclusiveMm ?? null,
    lengthAdvice: result.lengthAdvice ?? null,
    budget: result.budget ?? [],
    coverageFactor: result.coverageFactor ?? 2,
    effectiveDegreesOfFreedom: result.effectiveDegreesOfFreedom ?? null,
    budgetNote: result.note ?? null,
    identification: result.identification ?? null,
    criterion: result.criterion ?? 'area',
    resistanceOhmPerKm: result.resistanceOhmPerKm ?? null,
    UResistanceOhmPerKm: result.UResistanceOhmPerKm ?? null,
    limit: result.limit ?? null,
    consequence: result.consequence ?? null,
    fourWire: r.fourWire ?? null,
    confirmedUnusual: Boolean(r.confirmedUnusual),
    unusual: r.confirmedUnusual ? (result.unusual ?? null) : null,
    takenBy: person(r.takenBy),
    takenAt: r.takenAt,
    voided: r.voided,
    voidReason: r.voidReason,
    voidedBy: person(r.voidedBy),
    voidedAt: r.voidedAt,
  };
}
export type ReadingView = ReturnType<typeof readingView>;

/** Sample with its readings (voided ones included, oldest first); verdict ignores voided. */
export function sampleView(s: Sample) {
  const readings = s.readings.isInitialized()
    ? [...s.readings.getItems()].sort((a, b) => a.id - b.id)
    : [];
  return {
    id: s.id,
    seq: s.seq,
    unitRef: s.unitRef,
    conductorId: s.conductor.id,
    verdict: sampleVerdict(readings),
    disagreement: disagreementOf(readings),
    createdBy: person(s.createdBy),
    createdAt: s.createdAt,
    readings: readings.map(readingView),
  };
}

/** Two live readings of one sample that disagree by more than their combined U. */
export interface Disagreement {
  readingIds: [number, number];
  message: string;
}

/**
 * Flags two live readings of one sample whose areas differ by more than their combined
 * expanded uncertainty √(U₁² + U₂²) (issue 13; the E_n test of ISO/IEC 17043 and ISO 13528,
 * |E_n| > 1). Two-wire readings are left out: they decide nothing. The first such pair, or null.
 */
export function disagreementOf(
  readings: readonly Pick<
    Reading,
    'id' | 'voided' | 'method' | 'areaMm2' | 'expandedUMm2' | 'fourWire'
  >[],
): Disagreement | null {
  const live = readings.filter((r) => !r.voided && r.fourWire !== false);
  for (let i = 0; i < live.length; i++) {
    for (let j = i + 1; j < live.length; j++) {
      const a = live[i];
      const b = live[j];
      const combined = Math.sqrt(a.expandedUMm2 ** 2 + b.expandedUMm2 ** 2);
      const gap = Math.abs(a.areaMm2 - b.areaMm2);
      if (gap > combined) {
        const times = combined > 0 ? `${(gap / combined).toFixed(1)} times` : 'more than';
        return {
          readingIds: [a.id, b.id],
          message: `The ${a.method} and ${b.method} readings disagree: ${a.areaMm2.toPrecision(4)} and ${b.areaMm2.toPrecision(4)} mm² differ by ${times} their combined uncertainty. Check both for a slip, or a metal other than the one claimed.`,
        };
      }
    }
  }
  return null;
}
