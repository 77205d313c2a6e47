export const PRODUCT_KINDS = ['spool', 'kit'] as const;
export type ProductKind = (typeof PRODUCT_KINDS)[number];

export const CONDUCTOR_PURPOSES = ['power', 'ground', 'remote', 'speaker', 'other'] as const;
export type ConductorPurpose = (typeof CONDUCTOR_PURPOSES)[number];

export const CLAIMED_MATERIALS = [
  'copper',
  'tinned_copper',
  'cca10',
  'cca15',
  'aluminium',
] as const;
export type ClaimedMaterial = (typeof CLAIMED_MATERIALS)[number];

export type InspectionSeverity = 'normal' | 'tightened' | 'reduced' | 'discontinued';

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
