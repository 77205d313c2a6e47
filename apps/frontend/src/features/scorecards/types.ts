/** Scorecard shapes, shared with the server (libs/api-types). */
export type {
  TrendPoint,
  ScorecardRow,
  MoneyTotal,
  ScorecardList,
  HistogramBin,
  PurposeCount,
  ProductSeverity,
  WorstLot,
  SupplierScorecard,
} from '@gaugeproof/api-types';

/** A received-date range, both ends inclusive, `YYYY-MM-DD`. */
export interface DateRange {
  from: string;
  to: string;
}
