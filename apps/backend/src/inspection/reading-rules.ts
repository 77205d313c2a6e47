import type { InstrumentSnapshot, Reading, ReadingInputValue } from './entities/reading.entity';

/** What the audit trail keeps of a reading: an entity or a row the SQL writer holds. */
export interface AuditedReading {
  sampleId: number;
  method: Reading['method'];
  inputs: Record<string, ReadingInputValue>;
  instruments: readonly InstrumentSnapshot[];
  areaMm2: number;
  measuresAs: string;
  identifiedMaterial: string | null;
  verdict: Reading['verdict'];
  voided: boolean;
  voidReason: string | null;
}

export function auditShape(r: AuditedReading): Record<string, unknown> {
  return {
    sampleId: r.sampleId,
    method: r.method,
    inputs: r.inputs,
    instrumentIds: r.instruments.map((i) => i.id),
    areaMm2: r.areaMm2,
    measuresAs: r.measuresAs,
    identifiedMaterial: r.identifiedMaterial,
    verdict: r.verdict,
    voided: r.voided,
    voidReason: r.voidReason,
  };
}

/** The audit shape of a stored reading entity. */
export const auditShapeOf = (r: Reading) => auditShape({ ...r, sampleId: r.sample.id });

/** The computed part of a reading that a change of its siblings can alter. */
export function outcomeOf(r: Pick<Reading, 'identifiedMaterial' | 'materialMismatch' | 'verdict'>) {
  return `${r.identifiedMaterial}|${r.materialMismatch}|${r.verdict}`;
}
