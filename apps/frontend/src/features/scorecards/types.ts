/** Scorecard shapes (docs/api-conventions.md, "Scorecards"). */

export interface TrendPoint {
  /** `YYYY-MM` */
  month: string;
  lots: number;
  lotsAccepted: number;
  lotsDecided: number;
  acceptanceRate: number | null;
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
  dppm: number | null;
  readings: number;
  meanAreaRatio: number | null;
  lowestAreaRatio: number | null;
  materialMismatches: number;
  worstSizesShort: number | null;
  openCorrectiveActions: number;
  overdueCorrectiveActions: number;
  meanResponseDays: number | null;
  chargebacks: number;
  trend: TrendPoint[];
}

export interface ScorecardList {
  from: string;
  to: string;
  items: ScorecardRow[];
}

export interface HistogramBin {
  from: number | null;
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

/** A received-date range, both ends inclusive, `YYYY-MM-DD`. */
export interface DateRange {
  from: string;
  to: string;
}
