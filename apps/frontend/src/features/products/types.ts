import {
  CLAIMED_MATERIALS,
  CONDUCTOR_PURPOSES,
  PRODUCT_KINDS,
  type ClaimedMaterial,
  type ConductorPurpose,
  type InspectionSeverity,
  type ProductKind,
} from '@gaugeproof/api-types';
// The enums are the contract's (libs/api-types).
export {
  CLAIMED_MATERIALS,
  CONDUCTOR_PURPOSES,
  PRODUCT_KINDS,
  type ClaimedMaterial,
  type ConductorPurpose,
  type InspectionSeverity,
  type ProductKind,
};

export interface Conductor {
  id: number;
  position: number;
  purpose: ConductorPurpose;
  gauge: string;
  gaugeSystem: 'awg' | 'metric';
  nominalAreaMm2: number;
  claimedMaterial: ClaimedMaterial;
  claimedStrands: number | null;
}

export interface Product {
  id: number;
  supplier: { id: number; name: string; code: string; status: string };
  sku: string;
  kind: ProductKind;
  description: string;
  lengthPerUnitM: number | null;
  inspectionLevel: string;
  aql: string;
  minAreaRatio: number;
  active: boolean;
  conductors: Conductor[];
  inspectionState: {
    severity: InspectionSeverity;
    reason: string | null;
    reducedEligible: boolean;
  };
  warnings: string[];
  /** Moves on every save; an edit sends the one it was made on (a stale one: 409). */
  version: number;
}

export const kindLabels: Record<ProductKind, string> = { spool: 'Spool', kit: 'Wiring kit' };

export {
  conductorPurposeLabels as purposeLabels,
  claimedMaterialLabels as materialLabels,
  inspectionSeverityLabels as severityLabels,
} from '@/lib/labels';
