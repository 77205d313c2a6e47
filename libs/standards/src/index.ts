/**
 * @gaugeproof/standards: from a reading to a verdict. Pure computation, no I/O; every
 * constant names its source beside it.
 */
export const STANDARDS_VERSION = '0.1.0';

export { StandardsInputError } from './errors.js';
export * from './units.js';

export type { Gauge, GaugeSystem } from './gauges/types.js';
export {
  AWG_MAX,
  AWG_MIN,
  AWG_SIZES,
  awgDiameterInExact,
  awgGauge,
  awgLabel,
  roundSignificant,
} from './gauges/awg.js';
export { METRIC_AREAS_MM2, METRIC_SIZES, metricGauge, metricLabel } from './gauges/metric.js';
export { parseGauge } from './gauges/parse.js';
export { formatGaugeLabel } from './gauges/format.js';
export {
  largestSizeReached,
  measuresAs,
  standardSizes,
  type MeasuresAs,
} from './gauges/measures-as.js';

export {
  MATERIAL_IDS,
  MATERIALS,
  iec60228CopperFactor,
  massResistivity,
  materialById,
  resistanceFactor,
  type Material,
  type MaterialFamily,
  type MaterialId,
} from './materials.js';

export {
  COVERAGE_FACTOR,
  combinedRelative,
  meanUncertainty,
  resolutionUncertainty,
  toleranceUncertainty,
  type AreaResult,
  type BudgetComponent,
} from './uncertainty.js';
export { STANDARD_STRANDING_INCREMENT } from './methods/common.js';
export { areaFromMass, type AreaFromMassInput } from './methods/mass.js';
export { areaFromStrands, type AreaFromStrandsInput } from './methods/strands.js';
export { areaFromResistance, type AreaFromResistanceInput } from './methods/resistance.js';
export { areaFromDiameter, type AreaFromDiameterInput } from './methods/diameter.js';

export {
  IDENTIFICATION_TOLERANCE,
  identifyMaterial,
  type IdentifiedMaterial,
  type IdentifyMaterialInput,
  type MaterialIdentification,
} from './identify-material.js';
export {
  assessSample,
  type AssessSampleInput,
  type MaterialCheck,
  type SampleAssessment,
  type Verdict,
} from './assess-sample.js';

export {
  AQLS,
  CODE_LETTERS,
  INSPECTION_LEVELS,
  SAMPLING_TABLES_SOURCE,
  SEVERITIES,
  type Aql,
  type CodeLetter,
  type InspectionLevel,
  type Severity,
} from './sampling/tables.js';
export {
  acceptedAtTighterAql,
  aqlKey,
  codeLetterFor,
  lotOutcome,
  samplingPlan,
  type LotOutcome,
  type SamplingPlan,
  type SamplingPlanInput,
} from './sampling/plan.js';
export {
  approveReducedInspection,
  initialInspectionState,
  nextInspectionState,
  type InspectionSeverity,
  type InspectionState,
  type LotResult,
} from './sampling/switching.js';

export {
  INSTALLER_CAUTIONS,
  TYPICAL_MAX_DROP_FRACTION,
  TYPICAL_MAX_DROP_V,
  voltageDrop,
  type VoltageDrop,
  type VoltageDropInput,
} from './voltage-drop.js';
