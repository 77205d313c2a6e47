import { z } from 'zod';
import {
  CAR_STATUSES,
  INSPECTION_SEVERITIES,
  NOTICE_SWITCHES,
  RETURN_STATUSES,
  type NoticeSwitch,
} from '../enums.js';
import { sessionUser } from './catalog.js';
import { calendarDate, id, instant, storedFile } from './common.js';
import { reading, switchingNotice } from './lots.js';
import { correctiveAction, outboundMessage } from './records.js';

/** GET /api/health */
export const health = z.object({ status: z.string(), database: z.string(), time: instant });
export type Health = z.infer<typeof health>;

/** POST /api/auth/login: the session also travels as an httpOnly cookie. */
export const loginAnswer = z.object({ accessToken: z.string(), user: sessionUser });
export type LoginAnswer = z.infer<typeof loginAnswer>;

/** POST /api/lots/:id/readings/import */
export const importAnswer = z.object({ imported: z.number().int(), readings: z.array(reading) });
export type ImportAnswer = z.infer<typeof importAnswer>;

/** POST /api/products/:id/inspection-state/restore */
export const restoreAnswer = z.object({
  productId: id,
  severity: z.enum(INSPECTION_SEVERITIES),
  reason: z.string().nullable(),
  switching: switchingNotice,
});
export type RestoreAnswer = z.infer<typeof restoreAnswer>;

/** PATCH /api/corrective-actions/:id with `send`: the request and what became of its e-mail. */
export const correctiveActionUpdate = correctiveAction.extend({
  mail: z
    .object({ status: z.string(), to: z.string().optional(), error: z.string().optional() })
    .optional(),
});
export type CorrectiveActionUpdate = z.infer<typeof correctiveActionUpdate>;

/** POST /api/corrective-actions/:id/send */
export const supplierLinkSent = z.object({
  message: outboundMessage,
  link: z.object({ id, expiresAt: instant }),
});
export type SupplierLinkSent = z.infer<typeof supplierLinkSent>;

/** POST /api/corrective-actions/:id/revoke-links */
export const linksRevoked = z.object({ revoked: z.number().int() });
export type LinksRevoked = z.infer<typeof linksRevoked>;

/** GET /api/corrective-actions/:id/attachments: what the supplier sent. */
export const scarAttachment = z.object({
  id,
  ...storedFile.shape,
  addedBy: z.string().nullable(),
  createdAt: instant,
});
export type ScarAttachment = z.infer<typeof scarAttachment>;

/** A file as the supplier's page lists it. */
export const portalAttachment = storedFile.extend({ addedAt: instant });
export type PortalAttachment = z.infer<typeof portalAttachment>;

const portalLot = z.object({
  poNumber: z.string(),
  packingSlip: z.string().nullable(),
  supplierLotCode: z.string().nullable(),
  receivedOn: calendarDate,
  quantity: z.number(),
  unit: z.string(),
});

/** The supplier's page of one corrective action request, nothing more. */
export const portalScarView = z.object({
  kind: z.literal('corrective_action'),
  number: z.string(),
  status: z.enum(CAR_STATUSES),
  supplier: z.object({ name: z.string() }),
  problem: z.string(),
  dueOn: calendarDate,
  lots: z.array(portalLot),
  reopenComment: z.string().nullable(),
  answer: z.object({
    containment: z.string().nullable(),
    rootCause: z.string().nullable(),
    correctiveAction: z.string().nullable(),
    promisedOn: calendarDate.nullable(),
    respondedAt: instant.nullable(),
  }),
  canAnswer: z.boolean(),
  attachments: z.array(portalAttachment),
  evidencePack: z.object({ number: z.string() }).nullable(),
  linkExpiresAt: instant,
});
export type PortalScarView = z.infer<typeof portalScarView>;

/** The supplier's page of one return notice: its lots, note, chargeback and photos by place. */
export const portalReturnView = z.object({
  kind: z.literal('return'),
  number: z.string(),
  status: z.enum(RETURN_STATUSES),
  supplier: z.object({ name: z.string() }),
  note: z.string().nullable(),
  rmaNumber: z.string().nullable(),
  chargeback: z.object({ amount: z.number(), currency: z.string() }),
  emailedOn: calendarDate.nullable(),
  lots: z.array(portalLot),
  photos: z.array(
    z.object({
      n: z.number().int(),
      poNumber: z.string(),
      width: z.number().int(),
      height: z.number().int(),
      takenOn: calendarDate,
    }),
  ),
  evidencePack: z.object({ number: z.string() }),
  linkExpiresAt: instant,
});
export type PortalReturnView = z.infer<typeof portalReturnView>;

/** GET /api/supplier-portal/:token: the one request or return notice the link is for. */
export const portalView = z.discriminatedUnion('kind', [portalScarView, portalReturnView]);
export type PortalView = z.infer<typeof portalView>;

/** GET /api/me/notices: the signed-in user's e-mail notices. */
export const noticeSettings = z.object({
  choices: z.object({
    ...Object.fromEntries(NOTICE_SWITCHES.map((s) => [s, z.boolean()])),
    digest: z.boolean(),
  } as Record<NoticeSwitch | 'digest', z.ZodBoolean>),
  offered: z.array(z.enum(NOTICE_SWITCHES)),
  digestHourUtc: z.number().int(),
});
export type NoticeSettings = z.infer<typeof noticeSettings>;

/** GET /api/returns/unreturned-lots: rejected lots on no open return, oldest reject first. */
export const unreturnedLots = z.object({
  items: z.array(
    z.object({
      id,
      poNumber: z.string(),
      supplierLotCode: z.string().nullable(),
      quantity: z.number(),
      unit: z.string(),
      receivedAt: instant,
      rejectedAt: instant.nullable(),
      supplier: z.object({ id, name: z.string() }),
      product: z.object({ id, sku: z.string() }),
    }),
  ),
  more: z.boolean(),
});
export type UnreturnedLots = z.infer<typeof unreturnedLots>;
