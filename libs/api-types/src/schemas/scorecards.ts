import { z } from 'zod';
import { INSPECTION_SEVERITIES, READING_METHODS, SUPPLIER_STATUSES } from '../enums.js';
import { id } from './common.js';

// Scorecards (docs/api-conventions.md, "Scorecards").
export const trendPoint = z.object({
  /** `YYYY-MM` */
  month: z.string(),
  lots: z.number().int(),
  lotsAccepted: z.number().int(),
  lotsDecided: z.number().int(),
  /** lotsAccepted ÷ lotsDecided, null without decided lots. */
  acceptanceRate: z.number().nullable(),
  /** Mean areaRatio of the month's non-voided readings, null without readings. */
  meanAreaRatio: z.number().nullable(),
});
export type TrendPoint = z.infer<typeof trendPoint>;

export const methodAreaRatio = z.object({
  method: z.enum(READING_METHODS),
  readings: z.number().int(),
  meanAreaRatio: z.number(),
  lowestAreaRatio: z.number().nullable(),
});
export type MethodAreaRatio = z.infer<typeof methodAreaRatio>;

/** An amount in one ISO 4217 currency, to the cent. */
export const moneyTotal = z.object({ currency: z.string(), amount: z.number() });
export type MoneyTotal = z.infer<typeof moneyTotal>;

export const scorecardRow = z.object({
  supplierId: id,
  name: z.string(),
  code: z.string(),
  status: z.enum(SUPPLIER_STATUSES),
  lotsReceived: z.number().int(),
  lotsAccepted: z.number().int(),
  lotsAcceptedOnConcession: z.number().int(),
  lotsRejected: z.number().int(),
  lotsPending: z.number().int(),
  acceptanceRate: z.number().nullable(),
  samplesTested: z.number().int(),
  nonconformingSamples: z.number().int(),
  /** Units (kits, spools) with a live reading; a unit is nonconforming when any conductor is. */
  unitsTested: z.number().int(),
  nonconformingUnits: z.number().int(),
  /** Nonconforming units ÷ units tested (a kit with one short conductor is one unit). */
  unitNonconformingRate: z.number().nullable(),
  /** Nonconforming units per million units tested. */
  dppm: z.number().nullable(),
  readings: z.number().int(),
  meanAreaRatio: z.number().nullable(),
  lowestAreaRatio: z.number().nullable(),
  /** Area ratios per method: methods are not pooled (a mass and a resistance reading differ). */
  areaRatioByMethod: z.array(methodAreaRatio),
  materialMismatches: z.number().int(),
  worstSizesShort: z.number().nullable(),
  openCorrectiveActions: z.number().int(),
  overdueCorrectiveActions: z.number().int(),
  meanResponseDays: z.number().nullable(),
  /**
   * Chargebacks of the returns raised in the range, one total per ISO 4217 currency (by
   * code, only currencies with a return): amounts are never converted nor summed across
   * currencies. Empty when nothing was charged back.
   */
  chargebacks: z.array(moneyTotal),
  trend: z.array(trendPoint),
});
export type ScorecardRow = z.infer<typeof scorecardRow>;

export const scorecardList = z.object({
  from: z.string(),
  to: z.string(),
  items: z.array(scorecardRow),
});
export type ScorecardList = z.infer<typeof scorecardList>;

export const histogramBin = z.object({
  /** Lower edge, inclusive (null for the open-ended bin below the first edge). */
  from: z.number().nullable(),
  /** Upper edge, exclusive (null for the open-ended bin at and above the last edge). */
  to: z.number().nullable(),
  count: z.number().int(),
});
export type HistogramBin = z.infer<typeof histogramBin>;

export const purposeCount = z.object({
  purpose: z.string(),
  samplesTested: z.number().int(),
  nonconformingSamples: z.number().int(),
});
export type PurposeCount = z.infer<typeof purposeCount>;

export const productSeverity = z.object({
  productId: id,
  sku: z.string(),
  description: z.string(),
  active: z.boolean(),
  minAreaRatio: z.number(),
  severity: z.enum(INSPECTION_SEVERITIES),
  reason: z.string().nullable(),
});
export type ProductSeverity = z.infer<typeof productSeverity>;

export const worstLot = z.object({
  lotId: id,
  poNumber: z.string(),
  receivedAt: z.string(),
  status: z.string(),
  sku: z.string(),
  label: z.string().nullable(),
  measuresAs: z.string().nullable(),
  lowestAreaRatio: z.number(),
  sizesShort: z.number().nullable(),
});
export type WorstLot = z.infer<typeof worstLot>;

export const supplierScorecard = scorecardRow.extend({
  from: z.string(),
  to: z.string(),
  histogram: z.array(histogramBin),
  byPurpose: z.array(purposeCount),
  products: z.array(productSeverity),
  worstLots: z.array(worstLot),
});
export type SupplierScorecard = z.infer<typeof supplierScorecard>;
