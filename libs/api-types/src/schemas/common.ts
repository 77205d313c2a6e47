import { z } from 'zod';
import {
  INSTRUMENT_KINDS,
  PLAN_SEVERITIES,
  RESOLUTION_UNITS,
  SUPPLIER_STATUSES,
} from '../enums.js';

/** An instant as JSON carries it: ISO 8601 in UTC (`Date.toJSON`). */
export const instant = z.iso.datetime();
/** A calendar date `YYYY-MM-DD`. */
export const calendarDate = z.iso.date();
export const id = z.number().int().min(1);

/** One page of a list (docs/api-conventions.md, paging). */
export function pageOf<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int().nonnegative(),
    page: z.number().int().min(1),
    pageSize: z.number().int().min(1),
  });
}
export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export const personRef = z.object({ id, name: z.string() });

/** The end of every register record an edit may change (suppliers, products, instruments). */
export const editableRecord = z.object({
  /** The version an edit names; a stale one gets 409 (docs/api-conventions.md). */
  version: z.number().int().min(1),
  createdAt: instant,
  updatedAt: instant,
});

/** Evidence (a reading, a photo) is never deleted, only voided with a reason and stays shown. */
export const voidMark = z.object({
  voided: z.boolean(),
  voidReason: z.string().nullable(),
  voidedBy: personRef.nullable(),
  voidedAt: instant.nullable(),
});

/** What an instrument is and reads to: the register's record and a reading's copy share it. */
export const instrumentIdentity = z.object({
  id,
  kind: z.enum(INSTRUMENT_KINDS),
  name: z.string(),
  serial: z.string(),
  resolution: z.number(),
  resolutionUnit: z.enum(RESOLUTION_UNITS),
});

/** A file kept with a record (a SCAR's attachments, as staff and the supplier see them). */
export const storedFile = z.object({
  filename: z.string(),
  contentType: z.string(),
  sizeBytes: z.number().int(),
});
export type PersonRef = z.infer<typeof personRef>;

export const supplierRef = z.object({
  id,
  name: z.string(),
  code: z.string(),
  status: z.enum(SUPPLIER_STATUSES),
});
export type SupplierRef = z.infer<typeof supplierRef>;

/** The ISO 2859-1 plan stored with a lot, so later policy changes never rewrite history. */
export const samplingPlan = z.object({
  severity: z.enum(PLAN_SEVERITIES),
  level: z.string(),
  aql: z.string(),
  codeLetter: z.string(),
  sampleSize: z.number().int(),
  accept: z.number().int(),
  reject: z.number().int(),
  inspectAll: z.boolean(),
});
export type SamplingPlan = z.infer<typeof samplingPlan>;

/** One problem of a request, on the request field it is about (null when it names none). */
export const fieldError = z.object({ field: z.string().nullable(), message: z.string() });
export type FieldError = z.infer<typeof fieldError>;

/** Every error body (docs/api-conventions.md, errors). */
export const errorBody = z.object({
  statusCode: z.number().int(),
  error: z.string(),
  message: z.union([z.string(), z.array(z.string())]),
  errors: z.array(fieldError),
  path: z.string(),
  requestId: z.string(),
});
export type ErrorBody = z.infer<typeof errorBody>;

/** One problem of a refused CSV import: its spreadsheet row and column (null: the whole file). */
export const importRowError = z.object({
  row: z.number().int().nullable(),
  column: z.string().nullable(),
  message: z.string(),
});
export type ImportRowError = z.infer<typeof importRowError>;

/** A refused CSV import (422): the error body, its problems by row and column. */
export const importErrorBody = errorBody.extend({ errors: z.array(importRowError) });
export type ImportErrorBody = z.infer<typeof importErrorBody>;
