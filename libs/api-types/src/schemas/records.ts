import { z } from 'zod';
import {
  CALIBRATION_STATUSES,
  CAR_STATUSES,
  LOT_STATUSES,
  MESSAGE_STATUSES,
  RETURN_STATUSES,
} from '../enums.js';
import {
  calendarDate,
  editableRecord,
  id,
  instant,
  instrumentIdentity,
  personRef,
  supplierRef,
} from './common.js';

/** GET /api/instruments/:id */
export const instrument = z.object({
  ...instrumentIdentity.shape,
  /** Stated accuracy ± % of reading, ± an amount in resolutionUnit, certificate U (k = 2). */
  accuracyPercentOfReading: z.number().nullable(),
  accuracyAbsolute: z.number().nullable(),
  calibrationUncertainty: z.number().nullable(),
  calibratedOn: calendarDate,
  calibrationDueOn: calendarDate,
  active: z.boolean(),
  calibrationStatus: z.enum(CALIBRATION_STATUSES),
  daysToDue: z.number().int(),
  ...editableRecord.shape,
});
export type Instrument = z.infer<typeof instrument>;

const lotRef = z.object({ id, poNumber: z.string(), status: z.enum(LOT_STATUSES) });

/** How a case raised against a supplier (a return, a SCAR) ends: when closed, by whom opened. */
const caseEnd = z.object({
  closedAt: instant.nullable(),
  createdBy: personRef,
  createdAt: instant,
  updatedAt: instant,
});

export const returnCosts = z.object({
  inspectionHours: z.number().optional(),
  hourlyRate: z.number().optional(),
  freight: z.number().optional(),
  other: z.number().optional(),
});
export type ReturnCosts = z.infer<typeof returnCosts>;

/** GET /api/returns/:id */
export const vendorReturn = z.object({
  id,
  number: z.string(),
  status: z.enum(RETURN_STATUSES),
  /** Optimistic lock: send it back with every change. */
  version: z.number().int(),
  supplier: supplierRef.extend({ contactEmail: z.string().nullable() }),
  lots: z.array(lotRef.extend({ quantity: z.number(), unit: z.string() })),
  rmaNumber: z.string().nullable(),
  notes: z.string().nullable(),
  /** Why the goods come back, written for the supplier. */
  supplierNote: z.string().nullable(),
  shareDecisionReason: z.boolean(),
  costs: returnCosts,
  chargebackTotal: z.number(),
  /** ISO 4217 code of every amount. */
  currency: z.string(),
  emailedAt: instant.nullable(),
  shipment: z
    .object({
      carrier: z.string().nullable(),
      trackingNumber: z.string().nullable(),
      shippedOn: calendarDate,
      quantity: z.number().nullable(),
    })
    .nullable(),
  acknowledgedAt: instant.nullable(),
  credit: z
    .object({
      creditNoteNumber: z.string(),
      amount: z.number().nullable(),
      creditedAt: instant.nullable(),
    })
    .nullable(),
  cancelReason: z.string().nullable(),
  cancelledAt: instant.nullable(),
  ...caseEnd.shape,
});
export type VendorReturn = z.infer<typeof vendorReturn>;

/** GET /api/corrective-actions/:id (a SCAR). */
export const correctiveAction = z.object({
  id,
  number: z.string(),
  status: z.enum(CAR_STATUSES),
  /** Optimistic lock: send it back with every change. */
  version: z.number().int(),
  supplier: supplierRef,
  lots: z.array(lotRef),
  problem: z.string(),
  dueOn: calendarDate,
  /** Open or reopened past dueOn (the server's UTC calendar day). */
  overdue: z.boolean(),
  daysOverdue: z.number().int(),
  containment: z.string().nullable(),
  rootCause: z.string().nullable(),
  correctiveAction: z.string().nullable(),
  respondedAt: instant.nullable(),
  /** `supplier link (…)` when the supplier answered on its page, else who recorded it. */
  respondedBy: z.string().nullable(),
  promisedOn: calendarDate.nullable(),
  reopenComment: z.string().nullable(),
  verification: z
    .object({
      by: personRef.nullable(),
      at: instant,
      note: z.string().nullable(),
      lot: z.object({ id, poNumber: z.string() }).nullable(),
    })
    .nullable(),
  ...caseEnd.shape,
});
export type CorrectiveAction = z.infer<typeof correctiveAction>;

/** GET /api/messages: one outbound e-mail and its fate. */
export const outboundMessage = z.object({
  id,
  to: z.string(),
  /** The signed-in user who sent it: the supplier's answer goes there. */
  replyTo: z.string().nullable(),
  subject: z.string(),
  body: z.string(),
  attachments: z.array(z.looseObject({ filename: z.string(), contentType: z.string() })),
  status: z.enum(MESSAGE_STATUSES),
  /** The SMTP server's answer to the last failed attempt. */
  error: z.string().nullable(),
  attempts: z.number().int(),
  /** When the queue tries a failed message again; null once sent or given up. */
  nextAttemptAt: instant.nullable(),
  lastAttemptAt: instant.nullable(),
  relatedType: z.string().nullable(),
  relatedId: z.number().int().nullable(),
  sentById: z.number().int().nullable(),
  createdAt: instant,
  sentAt: instant.nullable(),
});
export type OutboundMessage = z.infer<typeof outboundMessage>;

/** One audit event as a timeline shows it (GET /api/audit). */
export const timelineEvent = z.object({
  id,
  at: instant,
  actor: personRef.nullable(),
  actorEmail: z.string(),
  action: z.string(),
  entityType: z.string(),
  entityId: z.number().int().nullable(),
  lotId: z.number().int().nullable(),
  summary: z.string(),
  before: z.record(z.string(), z.unknown()).nullable(),
  after: z.record(z.string(), z.unknown()).nullable(),
});
export type TimelineEvent = z.infer<typeof timelineEvent>;

/** GET /api/audit/facets: what the audit trail's filters offer. */
export const auditFacets = z.object({
  actions: z.array(z.string()),
  entityTypes: z.array(z.string()),
  people: z.array(z.object({ id, name: z.string(), email: z.string() })),
});
export type AuditFacets = z.infer<typeof auditFacets>;
