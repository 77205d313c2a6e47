import type { ProductKind } from '@gaugeproof/api-types';
// The enums and the shapes are the contract's (libs/api-types).
export {
  CLAIMED_MATERIALS,
  CONDUCTOR_PURPOSES,
  PRODUCT_KINDS,
  type ClaimedMaterial,
  type ConductorPurpose,
  type InspectionSeverity,
  type ProductKind,
} from '@gaugeproof/api-types';

export type { Conductor, Product } from '@gaugeproof/api-types';

export const kindLabels: Record<ProductKind, string> = { spool: 'Spool', kit: 'Wiring kit' };

export {
  conductorPurposeLabels as purposeLabels,
  claimedMaterialLabels as materialLabels,
  inspectionSeverityLabels as severityLabels,
} from '@/lib/labels';
