import { VERDICTS } from '@gaugeproof/standards';

/**
 * Every set of values both apps use, written once. Each is a readonly tuple (for
 * validation: `@IsIn(LOT_STATUSES)`, `z.enum(LOT_STATUSES)`) and a union type of its values.
 * Words shown to people for these values are the client's (its label vocabulary).
 *
 * The values the computation itself knows (materials, methods, verdicts, gauge systems,
 * IEC 60228 classes, ISO 2859-1 severities) are the standards library's own tuples, taken
 * from there under the contract's names, so the rule and its values cannot drift apart.
 */
export {
  /** What a product's conductor is sold as. */
  MATERIAL_IDS as CLAIMED_MATERIALS,
  type MaterialId as ClaimedMaterial,
  /** What the readings of a sample say the metal is. */
  IDENTIFIED_MATERIALS,
  type IdentifiedMaterial,
  /** IEC 60228 conductor classes a metric conductor may name (IEC 60228 clause 5). */
  CONDUCTOR_CLASSES,
  type ConductorClass,
  GAUGE_SYSTEMS,
  type GaugeSystem,
  /** The four ways a reading finds a conductor's cross-section. */
  READING_METHODS,
  type ReadingMethod,
  /** What a sample's verdict compares: the area (AWG) or the resistance (metric copper). */
  CRITERIA,
  type Criterion,
  VERDICTS,
  type Verdict,
  /** ISO 2859-1 inspection severity of a lot's plan. */
  SEVERITIES as PLAN_SEVERITIES,
  type Severity as PlanSeverity,
  /** A product's switching state: a plan severity, or inspection discontinued (ISO 2859-1 9.4). */
  INSPECTION_SEVERITIES,
  type InspectionSeverity,
} from '@gaugeproof/standards';

/** Roles of a signed-in account; admin may do everything. */
export const ROLES = ['clerk', 'qa_lead', 'purchasing', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** A lot's status from receipt to its decision (and a return). */
export const LOT_STATUSES = [
  'on_hold',
  'inspecting',
  'awaiting_decision',
  'accepted',
  'accepted_on_concession',
  'rejected',
  'returned',
] as const;
export type LotStatus = (typeof LOT_STATUSES)[number];

export const SUPPLIER_STATUSES = ['approved', 'probation', 'suspended'] as const;
export type SupplierStatus = (typeof SUPPLIER_STATUSES)[number];

export const PRODUCT_KINDS = ['spool', 'kit'] as const;
export type ProductKind = (typeof PRODUCT_KINDS)[number];

export const CONDUCTOR_PURPOSES = ['power', 'ground', 'remote', 'speaker', 'other'] as const;
export type ConductorPurpose = (typeof CONDUCTOR_PURPOSES)[number];

/** A sample's verdict; `untested` before its first live reading. */
export const SAMPLE_VERDICTS = [...VERDICTS, 'untested'] as const;
export type SampleVerdict = (typeof SAMPLE_VERDICTS)[number];

export const RECOMMENDATIONS = ['accept', 'reject', 'incomplete'] as const;
export type Recommendation = (typeof RECOMMENDATIONS)[number];

export const DECISION_OUTCOMES = ['accept', 'accept_on_concession', 'reject'] as const;
export type DecisionOutcome = (typeof DECISION_OUTCOMES)[number];

/** A concession's review: one against a reject recommendation may wait for a second approver. */
export const CONCESSION_STATUSES = ['pending', 'approved', 'refused'] as const;
export type ConcessionStatus = (typeof CONCESSION_STATUSES)[number];

/** E-mail notices a user may switch on (the profile page). */
export const NOTICE_SWITCHES = [
  'lotAwaitsDecision',
  'lotRejectNumber',
  'lotRejected',
  'scarOverdue',
  'scarAnswered',
  'concessionAwaitsApproval',
] as const;
export type NoticeSwitch = (typeof NOTICE_SWITCHES)[number];

export const NCR_STATUSES = ['open', 'closed'] as const;
export type NcrStatus = (typeof NCR_STATUSES)[number];

export const INSTRUMENT_KINDS = [
  'balance',
  'micrometer',
  'caliper',
  'length_rule',
  'milliohm_meter',
  'thermometer',
] as const;
export type InstrumentKind = (typeof INSTRUMENT_KINDS)[number];

export const RESOLUTION_UNITS = ['g', 'mm', 'ohm', 'mohm', 'degC'] as const;
export type ResolutionUnit = (typeof RESOLUTION_UNITS)[number];

/** What each kind of instrument can read in (common practice, no source). */
export const UNITS_BY_KIND: Record<InstrumentKind, readonly ResolutionUnit[]> = {
  balance: ['g'],
  micrometer: ['mm'],
  caliper: ['mm'],
  length_rule: ['mm'],
  milliohm_meter: ['ohm', 'mohm'],
  thermometer: ['degC'],
};

export const CALIBRATION_STATUSES = ['ok', 'due_soon', 'overdue'] as const;
export type CalibrationStatus = (typeof CALIBRATION_STATUSES)[number];

/**
 * A return (RMA): draft → emailed (the notice went to the supplier) → shipped (the goods
 * left) → acknowledged → credited → closed; a draft may be cancelled instead. A draft may
 * also be shipped before the notice is e-mailed.
 */
export const RETURN_STATUSES = [
  'draft',
  'emailed',
  'shipped',
  'acknowledged',
  'credited',
  'closed',
  'cancelled',
] as const;
export type ReturnStatus = (typeof RETURN_STATUSES)[number];

/** A supplier corrective action request (SCAR). */
export const CAR_STATUSES = ['open', 'responded', 'verified', 'reopened', 'closed'] as const;
export type CorrectiveActionStatus = (typeof CAR_STATUSES)[number];

/** An outbound e-mail's fate in the queue. */
export const MESSAGE_STATUSES = ['queued', 'sent', 'failed', 'logged'] as const;
export type MessageStatus = (typeof MESSAGE_STATUSES)[number];

export const SORT_DIRECTIONS = ['asc', 'desc'] as const;
export type SortDirection = (typeof SORT_DIRECTIONS)[number];
