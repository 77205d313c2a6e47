import { z } from 'zod';
import {
  CONCESSION_STATUSES,
  CRITERIA,
  DECISION_OUTCOMES,
  IDENTIFIED_MATERIALS,
  INSPECTION_SEVERITIES,
  LOT_STATUSES,
  PRODUCT_KINDS,
  READING_METHODS,
  RECOMMENDATIONS,
  SAMPLE_VERDICTS,
  VERDICTS,
} from '../enums.js';
import { product } from './catalog.js';
import {
  calendarDate,
  id,
  instant,
  instrumentIdentity,
  personRef,
  samplingPlan,
  supplierRef,
  voidMark,
} from './common.js';

/** A lot as lists show it (GET /api/lots). */
export const lotSummary = z.object({
  id,
  status: z.enum(LOT_STATUSES),
  poNumber: z.string(),
  packingSlip: z.string().nullable(),
  supplierLotCode: z.string().nullable(),
  quantity: z.number().int(),
  unit: z.string(),
  receivedAt: instant,
  receivedBy: personRef,
  product: z.object({
    id,
    sku: z.string(),
    description: z.string(),
    kind: z.enum(PRODUCT_KINDS),
  }),
  supplier: supplierRef,
  samplingPlan,
  version: z.number().int(),
});
export type LotSummary = z.infer<typeof lotSummary>;

/** POST /api/lots: the lot received, with what the clerk must see first. */
export const receivedLot = lotSummary.extend({
  notes: z.string().nullable(),
  supplierWarning: z.string().nullable(),
});
export type ReceivedLot = z.infer<typeof receivedLot>;

/** An instrument as a reading keeps it (the register may change later). */
export const instrumentSnapshot = z.object({
  ...instrumentIdentity.shape,
  calibrationDueOn: calendarDate,
  /** The register's stated accuracy and certificate U (k = 2) when the reading was taken. */
  accuracyPercentOfReading: z.number().nullable().optional(),
  accuracyAbsolute: z.number().nullable().optional(),
  calibrationUncertainty: z.number().nullable().optional(),
});
export type InstrumentSnapshot = z.infer<typeof instrumentSnapshot>;

/** One line of a reading's uncertainty budget (GUM 5.1.6). */
export const budgetLine = z.looseObject({
  name: z.string(),
  value: z.number(),
  unit: z.string(),
  standardUncertainty: z.number(),
  sensitivity: z.number(),
  relativeContribution: z.number(),
  note: z.string(),
  degreesOfFreedom: z.number().optional(),
});
export type BudgetLine = z.infer<typeof budgetLine>;

/** A reading with its results (POST /api/samples/:id/readings answers one). */
export const reading = z.object({
  id,
  sampleId: id,
  method: z.enum(READING_METHODS),
  inputs: z.record(z.string(), z.union([z.number(), z.array(z.number())])),
  instruments: z.array(instrumentSnapshot),
  areaMm2: z.number(),
  uMm2: z.number(),
  UMm2: z.number(),
  areaRatio: z.number(),
  measuresAs: z.string(),
  identifiedMaterial: z.enum(IDENTIFIED_MATERIALS).nullable(),
  materialMismatch: z.boolean(),
  verdict: z.enum(VERDICTS),
  reasons: z.array(z.string()),
  lengthForConclusiveMm: z.number().nullable(),
  /** Specimen-length advice (mass and resistance only), or null. */
  lengthAdvice: z.string().nullable(),
  budget: z.array(budgetLine),
  coverageFactor: z.number(),
  effectiveDegreesOfFreedom: z.number().nullable(),
  budgetNote: z.string().nullable(),
  /** How the material was told (the standards library's identification), or null. */
  identification: z.looseObject({}).nullable(),
  /** 'resistance' for metric copper (IEC 60228), 'area' otherwise. */
  criterion: z.enum(CRITERIA),
  resistanceOhmPerKm: z.number().nullable(),
  UResistanceOhmPerKm: z.number().nullable(),
  limit: z.looseObject({ maxOhmPerKm: z.number(), source: z.string() }).nullable(),
  consequence: z
    .looseObject({
      treatAs: z.string().nullable(),
      text: z.string(),
      cautions: z.array(z.string()),
    })
    .nullable(),
  fourWire: z.boolean().nullable(),
  confirmedUnusual: z.boolean(),
  unusual: z.array(z.looseObject({ field: z.string(), message: z.string() })).nullable(),
  takenBy: personRef.nullable(),
  takenAt: instant,
  ...voidMark.shape,
});
export type Reading = z.infer<typeof reading>;

/** Two live readings of one sample that disagree by more than their combined U. */
export const disagreement = z.object({
  readingIds: z.tuple([id, id]),
  message: z.string(),
});

/** A sample (one unit × one conductor) with its readings, voided ones included. */
export const sample = z.object({
  id,
  seq: z.number().int(),
  unitRef: z.string().nullable(),
  conductorId: id,
  verdict: z.enum(SAMPLE_VERDICTS),
  disagreement: disagreement.nullable(),
  createdBy: personRef.nullable(),
  createdAt: instant,
  readings: z.array(reading),
});
export type Sample = z.infer<typeof sample>;

/** Where a lot's inspection stands against its plan. */
export const evaluation = z.object({
  samplesPlanned: z.number().int(),
  samplesTested: z.number().int(),
  nonconforming: z.number().int(),
  inconclusive: z.number().int(),
  recommendation: z.enum(RECOMMENDATIONS),
  message: z.string(),
});
export type Evaluation = z.infer<typeof evaluation>;

export const photo = z.object({
  id,
  url: z.string(),
  thumbnailUrl: z.string(),
  caption: z.string().nullable(),
  sampleId: id.nullable(),
  sha256: z.string(),
  mimeType: z.string(),
  width: z.number().int(),
  height: z.number().int(),
  sizeBytes: z.number().int(),
  uploadedBy: personRef.nullable(),
  createdAt: instant,
  /** Voided photos stay, struck with their reason; they are no evidence. */
  ...voidMark.shape,
});
export type Photo = z.infer<typeof photo>;

export const decision = z.object({
  id,
  outcome: z.enum(DECISION_OUTCOMES),
  recommendation: z.enum(RECOMMENDATIONS),
  reason: z.string(),
  decidedBy: personRef,
  decidedAt: instant,
  lotVersion: z.number().int(),
  ncrNumber: z.string().nullable(),
});
export type Decision = z.infer<typeof decision>;

/** The lot page (GET /api/lots/:id). */
export const lotDetail = lotSummary.extend({
  notes: z.string().nullable(),
  supplierWarning: z.string().nullable(),
  product,
  samples: z.array(sample),
  photos: z.array(photo),
  evaluation,
  decisions: z.array(decision),
  ncrNumber: z.string().nullable(),
});
export type LotDetail = z.infer<typeof lotDetail>;

/** What a decision did to the product's ISO 2859-1 switching state. */
export const switchingNotice = z.object({
  from: z.enum(INSPECTION_SEVERITIES),
  to: z.enum(INSPECTION_SEVERITIES),
  changed: z.boolean(),
  reducedAvailable: z.boolean(),
  message: z.string(),
});
export type SwitchingNotice = z.infer<typeof switchingNotice>;

/** A concession: accepting a lot for a stated use, quantity and time. */
export const concession = z.object({
  id,
  lotId: id,
  status: z.enum(CONCESSION_STATUSES),
  scope: z.string(),
  quantity: z.number(),
  unit: z.string(),
  expiresOn: calendarDate,
  expired: z.boolean(),
  reason: z.string(),
  recommendation: z.enum(RECOMMENDATIONS),
  needsSecondApproval: z.boolean(),
  requestedBy: personRef,
  requestedAt: instant,
  reviewedBy: personRef.nullable(),
  reviewedAt: instant.nullable(),
  reviewNote: z.string().nullable(),
  decisionId: id.nullable(),
  version: z.number().int(),
});
export type Concession = z.infer<typeof concession>;

/**
 * POST /api/lots/:id/decisions (201), and a concession's approval: the decision written.
 * A concession that waits for a second approver answers 202 with `decision` null.
 */
export const decisionResult = z.object({
  decision: decision.nullable(),
  lot: lotSummary,
  evaluation,
  ncrNumber: z.string().nullable(),
  switching: switchingNotice.nullable(),
  pendingApproval: z.boolean(),
  concession: concession.nullable(),
});
export type DecisionResult = z.infer<typeof decisionResult>;

/** GET /api/products/:id/sampling-plan?quantity=N */
export const samplingPlanAnswer = z.object({
  samplingPlan: samplingPlan.nullable(),
  severity: z.enum(INSPECTION_SEVERITIES),
  discontinued: z.boolean(),
  message: z.string().nullable(),
});
export type SamplingPlanAnswer = z.infer<typeof samplingPlanAnswer>;

/** GET /api/inspection/reject-reached: lots awaiting a decision already at their reject number. */
export const rejectReached = z.object({
  items: z.array(
    lotSummary.extend({ nonconformingUnits: z.number().int(), reject: z.number().int() }),
  ),
  total: z.number().int().nonnegative(),
});
export type RejectReached = z.infer<typeof rejectReached>;

/** GET /api/lots/received-before: the lots already received under a PO and packing slip. */
export const receivedBefore = z.object({ lots: z.array(lotSummary) });
export type ReceivedBefore = z.infer<typeof receivedBefore>;

/** GET /api/concessions/awaiting-approval: pending concessions the caller may approve. */
export const concessionsAwaitingApproval = z.object({
  items: z.array(
    concession.extend({
      lot: z.object({
        id,
        poNumber: z.string(),
        supplier: z.object({ id, name: z.string() }),
        product: z.object({ id, sku: z.string() }),
      }),
    }),
  ),
});
export type ConcessionsAwaitingApproval = z.infer<typeof concessionsAwaitingApproval>;
