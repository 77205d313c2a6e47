/**
 * @gaugeproof/standards: from a reading to a verdict. Pure computation, no I/O; every
 * constant names its source beside it.
 */
export const STANDARDS_VERSION = '0.1.0';

export { StandardsInputError } from './errors.js';
export * from './units.js';

export { GAUGE_SYSTEMS, type Gauge, type GaugeSystem } from './gauges/types.js';
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
  BELOW_SMALLEST_SIZE,
  conductorMeasuresAs,
  largestSizeReached,
  measuresAs,
  nextSmallerSize,
  standardSizes,
  type ConductorMeasuresAs,
  type ConductorMeasuresAsInput,
  type MeasuresAs,
} from './gauges/measures-as.js';
export {
  CONDUCTOR_CLASSES,
  DEFAULT_CONDUCTOR_CLASS,
  iec60228MaxResistance,
  requireConductorClass,
  type ConductorClass,
  type CopperCoating,
  type ResistanceLimit,
} from './conductors/iec60228.js';
export {
  formatPercent,
  formatValueAtUncertainty,
  formatWithUncertainty,
  roundWithUncertainty,
  UNCERTAINTY_SIGNIFICANT_FIGURES,
  type RoundedMeasurement,
} from './format.js';

export {
  MATERIAL_IDS,
  MATERIALS,
  iec60228CopperFactor,
  massResistivity,
  materialById,
  parallelAlpha,
  TINNED_COPPER_MASS_RESISTIVITY,
  resistanceFactor,
  type Material,
  type MaterialFamily,
  type MaterialId,
} from './materials.js';

export {
  COVERAGE_FACTOR,
  calibrationStandardUncertainty,
  combinedRelative,
  coverageFactorFor,
  instrumentComponents,
  welchSatterthwaite,
  type InstrumentAccuracy,
  meanUncertainty,
  resolutionUncertainty,
  toleranceUncertainty,
  type AreaResult,
  type BudgetComponent,
} from './uncertainty.js';
export { STANDARD_STRANDING_INCREMENT } from './methods/common.js';
export { areaFromMass, type AreaFromMassInput } from './methods/mass.js';
export {
  areaFromStrands,
  MAX_STRAND_DIAMETERS,
  RECOMMENDED_STRAND_DIAMETERS,
  type AreaFromStrandsInput,
} from './methods/strands.js';
export {
  areaFromResistance,
  DEFAULT_TEMPERATURE_DIFFERENCE_C,
  type AreaFromResistanceInput,
} from './methods/resistance.js';
export { areaFromDiameter, type AreaFromDiameterInput } from './methods/diameter.js';

export {
  IDENTIFICATION_TOLERANCE,
  IDENTIFIED_MATERIALS,
  identifyMaterial,
  type IdentifiedMaterial,
  type IdentifyMaterialInput,
  type MaterialIdentification,
} from './identify-material.js';
export {
  assessSample,
  CRITERIA,
  PRACTICAL_SPECIMEN_LENGTH_MM,
  READING_METHODS,
  VERDICTS,
  type AssessSampleInput,
  type Criterion,
  type MaterialCheck,
  type ReadingMethod,
  type SampleAssessment,
  type Verdict,
} from './assess-sample.js';
export {
  installerConsequence,
  SHORT_CONDUCTOR_CAUTIONS,
  type InstallerConsequence,
} from './installer.js';
export {
  PLAUSIBLE_AREA_RATIO,
  questionReading,
  STRAND_COUNT_TOLERANCE,
  type PlausibilityInput,
  type PlausibilityQuestion,
} from './plausibility.js';

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
  INSPECT_ALL_RULE,
  lotOutcome,
  MAX_AQL_NONCONFORMING_UNITS,
  requireAqlForNonconformingUnits,
  SAMPLING_PLAN_NAME,
  sampleProgress,
  samplingPlan,
  type LotOutcome,
  type SampleProgress,
  type SamplingPlan,
  type SamplingPlanInput,
} from './sampling/plan.js';
export {
  approveReducedInspection,
  INSPECTION_SEVERITIES,
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
