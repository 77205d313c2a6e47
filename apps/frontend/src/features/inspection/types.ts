import {
  type ClaimedMaterial,
  type IdentifiedMaterial,
  type InstrumentKind,
  type ReadingMethod,
  type ResolutionUnit,
  type SampleVerdict,
  type Verdict as ReadingVerdict,
  type LotStatus,
} from '@gaugeproof/api-types';
/** Shapes of docs/api-conventions.md the Lot page works with. */
export {
  type ClaimedMaterial,
  type IdentifiedMaterial,
  type InstrumentKind,
  type ReadingMethod,
  type ResolutionUnit,
  type SampleVerdict,
  type ReadingVerdict,
};

export interface PersonRef {
  id: number;
  name: string;
}

export interface Conductor {
  id: number;
  position: number;
  purpose: 'power' | 'ground' | 'remote' | 'speaker' | 'other';
  gauge: string;
  gaugeSystem: 'awg' | 'metric';
  nominalAreaMm2: number;
  claimedMaterial: ClaimedMaterial;
  claimedStrands: number | null;
  /** IEC 60228 class of a metric conductor (1, 2, 5, 6); null for AWG. */
  conductorClass?: number | null;
}

export interface Instrument {
  id: number;
  kind: InstrumentKind;
  name: string;
  serial: string;
  resolution: number;
  resolutionUnit: ResolutionUnit;
  calibratedOn: string;
  calibrationDueOn: string;
  active: boolean;
  calibrationStatus: 'ok' | 'due_soon' | 'overdue';
  daysToDue: number;
  accuracyPercentOfReading?: number | null;
  accuracyAbsolute?: number | null;
  calibrationUncertainty?: number | null;
}

export type InstrumentSnapshot = Pick<
  Instrument,
  'id' | 'kind' | 'name' | 'serial' | 'resolution' | 'resolutionUnit' | 'calibrationDueOn'
>;

export interface Reading {
  id: number;
  sampleId: number;
  method: ReadingMethod;
  inputs: Record<string, number | number[]>;
  instruments: InstrumentSnapshot[];
  areaMm2: number;
  uMm2: number;
  UMm2: number;
  areaRatio: number;
  measuresAs: string;
  identifiedMaterial: IdentifiedMaterial | null;
  materialMismatch: boolean;
  verdict: ReadingVerdict;
  reasons: string[];
  lengthForConclusiveMm: number | null;
  /** Specimen-length advice (mass and resistance only), or null. */
  lengthAdvice?: string | null;
  /** The GUM budget of the reading (issue 13). */
  budget?: BudgetLine[];
  coverageFactor?: number;
  effectiveDegreesOfFreedom?: number | null;
  budgetNote?: string | null;
  /** 'resistance' for metric copper (IEC 60228), 'area' otherwise. */
  criterion?: 'area' | 'resistance';
  resistanceOhmPerKm?: number | null;
  UResistanceOhmPerKm?: number | null;
  limit?: { maxOhmPerKm: number; source: string } | null;
  consequence?: { treatAs: string | null; text: string; cautions: string[] } | null;
  fourWire?: boolean | null;
  confirmedUnusual?: boolean;
  unusual?: { field: string; message: string }[] | null;
  takenBy: PersonRef;
  takenAt: string;
  voided: boolean;
  voidReason: string | null;
  voidedBy: PersonRef | null;
  voidedAt: string | null;
}

/** One line of a reading's uncertainty budget (GUM 5.1.6). */
export interface BudgetLine {
  name: string;
  value: number;
  unit: string;
  standardUncertainty: number;
  sensitivity: number;
  relativeContribution: number;
  note: string;
  degreesOfFreedom?: number;
}

export interface Sample {
  id: number;
  seq: number;
  unitRef: string | null;
  conductorId: number;
  verdict: SampleVerdict;
  createdBy: PersonRef;
  createdAt: string;
  readings: Reading[];
  /** Two live readings that disagree by more than their combined U (issue 13). */
  disagreement?: { readingIds: [number, number]; message: string } | null;
}

export interface Evaluation {
  samplesPlanned: number;
  samplesTested: number;
  nonconforming: number;
  inconclusive: number;
  recommendation: 'accept' | 'reject' | 'incomplete';
  message: string;
}

export interface Photo {
  id: number;
  url: string;
  thumbnailUrl: string;
  caption: string | null;
  sampleId: number | null;
  sha256: string;
  mimeType: string;
  width: number;
  height: number;
  sizeBytes: number;
  uploadedBy: PersonRef;
  createdAt: string;
  voided: boolean;
  voidReason: string | null;
  voidedBy: PersonRef | null;
  voidedAt: string | null;
}

export { type LotStatus };

export interface LotDetail {
  id: number;
  status: LotStatus;
  poNumber: string;
  packingSlip: string | null;
  supplierLotCode: string | null;
  quantity: number;
  unit: string;
  receivedAt: string;
  receivedBy: PersonRef;
  supplier: {
    id: number;
    name: string;
    code: string;
    status: 'approved' | 'probation' | 'suspended';
  };
  samplingPlan: {
    severity: 'normal' | 'tightened' | 'reduced';
    level: string;
    aql: string;
    codeLetter: string;
    sampleSize: number;
    accept: number;
    reject: number;
    inspectAll: boolean;
  };
  version: number;
  notes: string | null;
  supplierWarning: string | null;
  product: {
    id: number;
    sku: string;
    description: string;
    kind: 'spool' | 'kit';
    minAreaRatio: number;
    conductors: Conductor[];
    warnings: string[];
  };
  samples: Sample[];
  photos: Photo[];
  evaluation: Evaluation;
  ncrNumber: string | null;
}
