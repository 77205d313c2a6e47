/**
 * Every numeric limit both apps check, written once: the server's DTOs validate with
 * these, the client's forms refuse the same values before sending. A limit is inclusive.
 * Sources beside each; "common practice, no source" where the bound is only a guard.
 */

export interface Range {
  readonly min: number;
  readonly max: number;
}

/** Inputs of one reading (POST /api/samples/:id/readings and the CSV import). */
export const READING_LIMITS = {
  /** Specimen length, mm: 10 mm to 100 m (common practice, no source). */
  lengthMm: { min: 10, max: 100_000 },
  /** Strands counted (common practice, no source). */
  count: { min: 1, max: 100_000 },
  /** One strand's diameter, mm; above 0 (common practice, no source). */
  strandDiameterMm: { min: 0, max: 20 },
  /** Strand diameters in one reading (issue 13). */
  strandDiameters: { min: 1, max: 10 },
  /** Conductor temperature of a resistance reading, °C (common practice, no source). */
  temperatureC: { min: -40, max: 100 },
  /** A solid conductor's diameter, mm; above 0 (common practice, no source). */
  diameterMm: { min: 0, max: 100 },
  /** Stranding increment k as a fraction (0.02 = ASTM B496's 2 %); 0 for a solid conductor. */
  strandingIncrement: { min: 0, max: 0.5 },
  /** Instruments one reading names (common practice, no source). */
  instruments: { min: 1, max: 6 },
} as const satisfies Record<string, Range>;

/**
 * Units in a lot: from one (a lot of one is inspected whole: when the sample size equals or
 * exceeds the lot size, every unit is inspected, ANSI/ASQ Z1.4 / ISO 2859-1); the top keeps
 * the number exact (common practice, no source).
 */
export const LOT_QUANTITY: Range = { min: 1, max: 10_000_000 };

/** A unit number in a lot (a sample's seq) (common practice, no source). */
export const SAMPLE_SEQ: Range = { min: 1, max: 100_000 };

/** Strands a conductor is sold with (common practice, no source). */
export const CLAIMED_STRANDS: Range = { min: 1, max: 100_000 };

/** Conductors in one product (common practice, no source). */
export const PRODUCT_CONDUCTORS: Range = { min: 1, max: 12 };

/** Metres of cable in one unit of a product; above 0 (common practice, no source). */
export const LENGTH_PER_UNIT_M: Range = { min: 0.01, max: 100_000 };

/** Minimum area ratio a product may demand (common practice, no source). */
export const MIN_AREA_RATIO: Range = { min: 0.5, max: 1 };

/** An instrument's stated accuracy, ± % of reading (common practice, no source). */
export const ACCURACY_PERCENT: Range = { min: 0, max: 10 };

/** Lots one return or one corrective action request names (common practice, no source). */
export const LOTS_PER_REQUEST: Range = { min: 1, max: 100 };

/** Amounts of a return's costs and credit (common practice, no source). */
export const RETURN_AMOUNTS = {
  inspectionHours: { min: 0, max: 10_000 },
  hourlyRate: { min: 0, max: 100_000 },
  freight: { min: 0, max: 10_000_000 },
  other: { min: 0, max: 10_000_000 },
  creditAmount: { min: 0, max: 10_000_000 },
  /** Units shipped back; above 0. */
  shippedQuantity: { min: 0.001, max: 100_000_000 },
} as const satisfies Record<string, Range>;

/** Longest text a field may hold, in characters (common practice, no source). */
export const TEXT_MAX = {
  /** Notes, problems, answers, decision reasons. */
  long: 4000,
  /** A void or cancel reason. */
  reason: 2000,
  /** A product's description. */
  description: 300,
  /** A supplier's name. */
  supplierName: 160,
  /** A supplier's short code (letters, digits, - and _). */
  supplierCode: 32,
  /** A person's or an instrument's name. */
  name: 120,
  /** An e-mail address (RFC 5321 4.5.3.1.3 path limit, less the brackets). */
  email: 254,
  /** Reference numbers: PO, packing slip, supplier lot code, serial, RMA, tracking, unit ref. */
  reference: 64,
  /** A gauge label such as "4 AWG". */
  gauge: 32,
  /** A lot's unit word (spools, kits …). */
  unit: 16,
  /** What a concession lets the material be used for. */
  scope: 1000,
} as const;

/** Shortest reasons, in characters, so a reason says something (common practice, no source). */
export const TEXT_MIN = {
  /** Why a reading or a photo is voided. */
  voidReason: 10,
  /** The problem a corrective action request states. */
  problem: 10,
  /** A supplier's answer (containment, root cause, corrective action), a reopen comment, a verification note, a concession's scope and a refusal's note. */
  answer: 10,
  /** A decision's reason where one is needed: against the recommendation, or on concession (issue 5). */
  decisionReason: 20,
  cancelReason: 5,
  carrier: 2,
} as const;

/**
 * Passwords: at least 10 characters once trimmed (NIST SP 800-63B 5.1.1.2 asks 8; ours is
 * 10); at most 72 bytes, all bcrypt reads (the bcrypt algorithm, Provos & Mazières 1999).
 */
export const PASSWORD = { minLength: 10, maxBytes: 72 } as const;

/**
 * Reading rows one import takes at the most (our choice, stated in the README): a full
 * day's bench log of a large lot. An import answers in time proportional to its rows.
 */
export const MAX_IMPORT_ROWS = 5000;

/** Largest photo upload, bytes: a phone photo is 2–8 MB (issue 4; common practice, no source). */
export const MAX_PHOTO_BYTES = 15 * 1024 * 1024;

/** Largest file a supplier attaches, bytes: a scanned 8D report or a few phone photos (common practice, no source). */
export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024;

/** Longest range a scorecard answers, in calendar months: five years of monthly buckets (our choice). */
export const MAX_RANGE_MONTHS = 60;

/** A currency as ISO 4217 writes it: three capital letters (ISO 4217, alphabetic code). */
export const CURRENCY_CODE = /^[A-Z]{3}$/;

/** Rows of a list page (docs/api-conventions.md, paging). */
export const PAGE_SIZE = { default: 25, max: 100 } as const;
