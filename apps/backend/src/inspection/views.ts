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
    budget?: unknown[];
    identification?: unknown;
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
    budget: result.budget ?? [],
    identification: result.identification ?? null,
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
    createdBy: person(s.createdBy),
    createdAt: s.createdAt,
    readings: readings.map(readingView),
  };
}
