import {
  LOT_STATUSES,
  type LotStatus,
  type PlanSeverity,
  type SupplierStatus,
  type ClaimedMaterial,
  type ConductorPurpose,
  type InspectionSeverity,
  type Conductor,
  type Product,
  type Supplier,
} from '@gaugeproof/api-types';
// The enums and the shapes are the contract's (libs/api-types).
export { LOT_STATUSES, type LotStatus, type PlanSeverity, type SupplierStatus };
export { type ClaimedMaterial, type ConductorPurpose, type InspectionSeverity };
export type {
  LotSummary,
  PersonRef,
  SamplingPlan,
  SamplingPlanAnswer,
  SupplierRef,
} from '@gaugeproof/api-types';

/** A product's conductor as the receiving form offers it (GET /api/products). */
export type ConductorOption = Conductor;
/** A product as the receiving form offers it (GET /api/products). */
export type ProductOption = Product;
/** A supplier as the receiving form offers it (GET /api/suppliers). */
export type SupplierOption = Supplier;
