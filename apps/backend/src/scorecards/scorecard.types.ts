/** Response shapes of the scorecards, shared with the client (libs/api-types). */
export type {
  TrendPoint,
  ScorecardRow,
  ScorecardList,
  HistogramBin,
  PurposeCount,
  ProductSeverity,
  WorstLot,
  SupplierScorecard,
} from '@gaugeproof/api-types';
