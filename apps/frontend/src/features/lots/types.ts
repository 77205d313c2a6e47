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

export type SupplierStatus = 'approved' | 'probation' | 'suspended';
export type PlanSeverity = 'normal' | 'tightened' | 'reduced';

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

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export type ConductorPurpose = 'power' | 'ground' | 'remote' | 'speaker' | 'other';
export type ClaimedMaterial = 'copper' | 'tinned_copper' | 'cca10' | 'cca15' | 'aluminium';

export interface ConductorOption {
  id: number;
  position: number;
  purpose: ConductorPurpose;
  gauge: string;
  nominalAreaMm2: number;
  claimedMaterial: ClaimedMaterial;
  claimedStrands: number | null;
}

export type InspectionSeverity = 'normal' | 'tightened' | 'reduced' | 'discontinued';

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
