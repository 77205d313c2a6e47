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
/** The Lot page's enums and shapes are the contract's (libs/api-types). */
export {
  type ClaimedMaterial,
  type IdentifiedMaterial,
  type InstrumentKind,
  type ReadingMethod,
  type ResolutionUnit,
  type SampleVerdict,
  type ReadingVerdict,
  type LotStatus,
};
export type {
  BudgetLine,
  Conductor,
  Evaluation,
  Instrument,
  InstrumentSnapshot,
  LotDetail,
  PersonRef,
  Photo,
  Reading,
  Sample,
} from '@gaugeproof/api-types';
