/**
 * The response schemas (zod): `@gaugeproof/api-types/schemas`. The OpenAPI document's
 * response schemas are made from these, and the client may parse with them. The types
 * are exported from the package root too, without loading zod.
 */
export * from './common.js';
export * from './catalog.js';
export * from './lots.js';
export * from './records.js';
export * from './scorecards.js';
export * from './answers.js';
export * from './openapi.js';
