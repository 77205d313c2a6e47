import { z } from 'zod';
import {
  CLAIMED_MATERIALS,
  CONDUCTOR_PURPOSES,
  GAUGE_SYSTEMS,
  INSPECTION_SEVERITIES,
  PRODUCT_KINDS,
  ROLES,
  SUPPLIER_STATUSES,
} from '../enums.js';
import { editableRecord, id, instant, supplierRef } from './common.js';

/** GET /api/suppliers/:id */
export const supplier = z.object({
  id,
  name: z.string(),
  code: z.string(),
  contactEmail: z.string().nullable(),
  status: z.enum(SUPPLIER_STATUSES),
  notes: z.string().nullable(),
  ...editableRecord.shape,
});
export type Supplier = z.infer<typeof supplier>;

/** One conductor of a product. */
export const conductor = z.object({
  id,
  position: z.number().int(),
  purpose: z.enum(CONDUCTOR_PURPOSES),
  gauge: z.string(),
  gaugeSystem: z.enum(GAUGE_SYSTEMS),
  nominalAreaMm2: z.number(),
  claimedMaterial: z.enum(CLAIMED_MATERIALS),
  claimedStrands: z.number().int().nullable(),
  /** IEC 60228 class of a metric conductor (1, 2, 5, 6); null for AWG. */
  conductorClass: z.number().int().nullable(),
  active: z.boolean(),
});
export type Conductor = z.infer<typeof conductor>;

/** A product's ISO 2859-1 switching state. */
export const inspectionState = z.object({
  severity: z.enum(INSPECTION_SEVERITIES),
  reason: z.string().nullable(),
  reducedEligible: z.boolean(),
});
export type InspectionState = z.infer<typeof inspectionState>;

/** GET /api/products/:id */
export const product = z.object({
  id,
  supplier: supplierRef,
  sku: z.string(),
  kind: z.enum(PRODUCT_KINDS),
  description: z.string(),
  lengthPerUnitM: z.number().nullable(),
  inspectionLevel: z.string(),
  aql: z.string(),
  minAreaRatio: z.number(),
  /** A concession against a reject recommendation waits for a second approver. */
  concessionNeedsApproval: z.boolean(),
  active: z.boolean(),
  conductors: z.array(conductor),
  inspectionState,
  warnings: z.array(z.string()),
  ...editableRecord.shape,
});
export type Product = z.infer<typeof product>;

/** The signed-in account (GET /api/auth/me). */
export const sessionUser = z.object({
  id,
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
});
export type SessionUser = z.infer<typeof sessionUser>;

/** GET /api/users/:id */
export const user = sessionUser.extend({
  active: z.boolean(),
  version: editableRecord.shape.version,
  createdAt: instant,
});
export type User = z.infer<typeof user>;
