import type { Conductor, Product, Supplier } from '@gaugeproof/api-types';
// The enums and the shapes are the contract's (libs/api-types).
export {
  LOT_STATUSES,
  type ClaimedMaterial,
  type ConductorPurpose,
  type InspectionSeverity,
  type LotStatus,
  type LotSummary,
  type PersonRef,
  type PlanSeverity,
  type SamplingPlan,
  type SamplingPlanAnswer,
  type SupplierRef,
  type SupplierStatus,
} from '@gaugeproof/api-types';

/** A product's conductor as the receiving form offers it (GET /api/products). */
export type ConductorOption = Conductor;
/** A product as the receiving form offers it (GET /api/products). */
export type ProductOption = Product;
/** A supplier as the receiving form offers it (GET /api/suppliers). */
export type SupplierOption = Supplier;
