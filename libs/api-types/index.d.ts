/**
 * Response shapes the server sends and the client reads, written once for both
 * (docs/api-conventions.md). Types only: nothing here runs, so the package has no build.
 */

// Scorecards (docs/api-conventions.md, "Scorecards").
export interface TrendPoint {
  /** `YYYY-MM` */
  month: string;
  lots: number;
  lotsAccepted: number;
  lotsDecided: number;
  /** lotsAccepted ÷ lotsDecided, null without decided lots. */
  acceptanceRate: number | null;
  /** Mean areaRatio of the month's non-voided readings, null without readings. */
  meanAreaRatio: number | null;
}

export interface ScorecardRow {
  supplierId: number;
  name: string;
  code: string;
  status: 'approved' | 'probation' | 'suspended';
  lotsReceived: number;
  lotsAccepted: number;
  lotsAcceptedOnConcession: number;
  lotsRejected: number;
  lotsPending: number;
  acceptanceRate: number | null;
  samplesTested: number;
  nonconformingSamples: number;
  /** Units (kits, spools) with a live reading; a unit is nonconforming when any conductor is. */
  unitsTested: number;
  nonconformingUnits: number;
  /** Nonconforming units ÷ units tested (a kit with one short conductor is one unit). */
  unitNonconformingRate: number | null;
  /** Nonconforming units per million units tested. */
  dppm: number | null;
  readings: number;
  meanAreaRatio: number | null;
  lowestAreaRatio: number | null;
  /** Area ratios per method: methods are not pooled (a mass and a resistance reading differ). */
  areaRatioByMethod: MethodAreaRatio[];
  materialMismatches: number;
  worstSizesShort: number | null;
  openCorrectiveActions: number;
  overdueCorrectiveActions: number;
  meanResponseDays: number | null;
  /**
   * Chargebacks of the returns raised in the range, one total per ISO 4217 currency (by
   * code, only currencies with a return): amounts are never converted nor summed across
   * currencies. Empty when nothing was charged back.
   */
  chargebacks: MoneyTotal[];
  trend: TrendPoint[];
}

/** An amount in one ISO 4217 currency, to the cent. */
export interface MoneyTotal {
  currency: string;
  amount: number;
}

export interface MethodAreaRatio {
  method: 'mass' | 'strands' | 'resistance' | 'diameter';
  readings: number;
  meanAreaRatio: number;
  lowestAreaRatio: number | null;
}

export interface ScorecardList {
  from: string;
  to: string;
  items: ScorecardRow[];
}

export interface HistogramBin {
  /** Lower edge, inclusive (null for the open-ended bin below the first edge). */
  from: number | null;
  /** Upper edge, exclusive (null for the open-ended bin at and above the last edge). */
  to: number | null;
  count: number;
}

export interface PurposeCount {
  purpose: string;
  samplesTested: number;
  nonconformingSamples: number;
}

export interface ProductSeverity {
  productId: number;
  sku: string;
  description: string;
  active: boolean;
  minAreaRatio: number;
  severity: 'normal' | 'tightened' | 'reduced' | 'discontinued';
  reason: string | null;
}

export interface WorstLot {
  lotId: number;
  poNumber: string;
  receivedAt: string;
  status: string;
  sku: string;
  label: string | null;
  measuresAs: string | null;
  lowestAreaRatio: number;
  sizesShort: number | null;
}

export interface SupplierScorecard extends ScorecardRow {
  from: string;
  to: string;
  histogram: HistogramBin[];
  byPurpose: PurposeCount[];
  products: ProductSeverity[];
  worstLots: WorstLot[];
}
