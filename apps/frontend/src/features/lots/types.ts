import {
  LOT_STATUSES,
  type LotStatus,
  type PlanSeverity,
  type SupplierStatus,
  type ClaimedMaterial,
  type ConductorPurpose,
  type InspectionSeverity,
} from '@gaugeproof/api-types';
export { LOT_STATUSES, type LotStatus, type PlanSeverity, type SupplierStatus };

/** The plan stored with the lot (docs/api-conventions.md SamplingPlan). */
export interface SamplingPlan {
  severity: PlanSeverity;
  level: string;
  aql: string;
  codeLetter: string;
  sampleSize: number;
  accept: number;
  reject: number;
  inspectAll: boolean;
}

export interface PersonRef {
  id: number;
  name: string;
}

export interface SupplierRef {
  id: number;
  name: string;
  code: string;
  status: SupplierStatus;
}

export interface LotSummary {
  id: number;
  status: LotStatus;
  poNumber: string;
  packingSlip: string | null;
  supplierLotCode: string | null;
  quantity: number;
  unit: string;
  /** ISO instant. */
  receivedAt: string;
  receivedBy: PersonRef;
  product: { id: number; sku: string; description: string; kind: 'spool' | 'kit' };
  supplier: SupplierRef;
  samplingPlan: SamplingPlan;
  version: number;
}

export { type ClaimedMaterial, type ConductorPurpose };

export interface ConductorOption {
  id: number;
  position: number;
  purpose: ConductorPurpose;
  gauge: string;
  nominalAreaMm2: number;
  claimedMaterial: ClaimedMaterial;
  claimedStrands: number | null;
}

export { type InspectionSeverity };

/** What the receiving form needs of a product (docs/api-conventions.md Product). */
export interface ProductOption {
  id: number;
  supplier: SupplierRef;
  sku: string;
  kind: 'spool' | 'kit';
  description: string;
  lengthPerUnitM: number | null;
  inspectionLevel: string;
  aql: string;
  minAreaRatio: number;
  active: boolean;
  conductors: ConductorOption[];
  inspectionState: {
    severity: InspectionSeverity;
    reason: string | null;
    reducedEligible: boolean;
  };
  warnings: string[];
}

export interface SupplierOption extends SupplierRef {
  contactEmail: string | null;
  notes: string | null;
}

/** GET /api/products/:id/sampling-plan?quantity=N */
export interface SamplingPlanAnswer {
  samplingPlan: SamplingPlan | null;
  severity: InspectionSeverity;
  discontinued: boolean;
  message: string | null;
}
