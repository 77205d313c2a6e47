/**
 * The contract both apps build on (DEVELOPERS.md "One contract"): every enum, every numeric
 * limit and the number parsing rule as runtime values, and every response shape as a type.
 * The zod schemas the shapes come from are in `@gaugeproof/api-types/schemas`; this entry
 * loads no zod.
 */
export * from './enums.js';
export * from './limits.js';
export * from './numbers.js';
export type * from './schemas/index.js';
