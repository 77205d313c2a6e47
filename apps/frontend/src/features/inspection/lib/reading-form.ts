import { z } from 'zod';
import { parseDecimal, parseDecimalList, READING_LIMITS, type Range } from '@gaugeproof/api-types';
import type {
  InputField,
  MethodDefinition,
  ResolutionSlot,
} from '@/features/inspection/lib/reading-methods';
import type { Instrument, ReadingMethod } from '@/features/inspection/types';

export type FieldName = InputField['name'];

/** What the reading form holds: typed text per input, an instrument id (or '') per slot. */
export interface ReadingFormValues {
  values: Partial<Record<FieldName, string>>;
  instruments: Partial<Record<ResolutionSlot, string>>;
}

/**
 * Typed text → number, the rule of the contract (libs/api-types): the same in this form and
 * in the server's CSV import ("76,1" is 76.1; "0x10" is no number in either).
 */
export { parseDecimal, parseDecimalList };

/** The bounds of a reading's inputs, the server's (READING_LIMITS); above 0 where min is 0. */
const FIELD_LIMITS: Readonly<Record<FieldName, Range | null>> = {
  massG: null,
  lengthMm: READING_LIMITS.lengthMm,
  count: READING_LIMITS.count,
  strandDiameterMm: READING_LIMITS.strandDiameterMm,
  resistanceOhm: null,
  temperatureC: READING_LIMITS.temperatureC,
  diameterMm: READING_LIMITS.diameterMm,
};

/** What is wrong with one typed value of a field, or null. */
function outOfRange(field: InputField, value: number): string | null {
  const range = FIELD_LIMITS[field.name];
  if (field.allowNonPositive) {
    // A temperature may be zero or below; its bounds are the contract's.
    return range && (value < range.min || value > range.max)
      ? `Enter a temperature from ${range.min} to ${range.max} ${field.unit}.`
      : null;
  }
  if (value <= 0) return 'Must be greater than 0.';
  if (range && value < range.min) return `Enter at least ${range.min} ${field.unit}.`;
  if (range && value > range.max) return `Enter at most ${range.max} ${field.unit}.`;
  return null;
}

function listSchema(field: InputField) {
  const { max } = READING_LIMITS.strandDiameters;
  const range = FIELD_LIMITS[field.name];
  return z.string().superRefine((text, ctx) => {
    const values = parseDecimalList(text);
    if (text.trim() === '') {
      ctx.addIssue({ code: 'custom', message: `Enter the ${field.label.toLowerCase()}.` });
    } else if (values === null) {
      ctx.addIssue({
        code: 'custom',
        message: `Enter numbers in ${field.unit}, separated by spaces.`,
      });
    } else if (values.length > max) {
      ctx.addIssue({ code: 'custom', message: `Enter at most ${max} values.` });
    } else if (values.some((v) => v <= 0)) {
      ctx.addIssue({ code: 'custom', message: 'Each must be greater than 0.' });
    } else if (range && values.some((v) => v > range.max)) {
      ctx.addIssue({ code: 'custom', message: `Each must be at most ${range.max} ${field.unit}.` });
    }
  });
}

function fieldSchema(field: InputField) {
  if (field.list) return listSchema(field);
  return z.string().superRefine((text, ctx) => {
    if (text.trim() === '') {
      ctx.addIssue({ code: 'custom', message: `Enter the ${field.label.toLowerCase()}.` });
      return;
    }
    const value = parseDecimal(text);
    if (value === null) {
      ctx.addIssue({ code: 'custom', message: `Enter a number, in ${field.unit}.` });
    } else if (field.integer && !Number.isInteger(value)) {
      ctx.addIssue({ code: 'custom', message: 'Enter a whole number.' });
    } else {
      const wrong = outOfRange(field, value);
      if (wrong) ctx.addIssue({ code: 'custom', message: wrong });
    }
  });
}

export function buildReadingSchema(definition: MethodDefinition) {
  const values = Object.fromEntries(definition.fields.map((f) => [f.name, fieldSchema(f)]));
  const instruments = Object.fromEntries(
    definition.instruments.map((slot) => [
      slot.slot,
      slot.required
        ? z.string().min(1, `Choose the ${slot.label.toLowerCase()} you used.`)
        : z.string().optional(),
    ]),
  );
  return z.object({ values: z.object(values), instruments: z.object(instruments) });
}

export function emptyReadingForm(definition: MethodDefinition): ReadingFormValues {
  return {
    values: Object.fromEntries(definition.fields.map((f) => [f.name, ''])),
    instruments: Object.fromEntries(definition.instruments.map((s) => [s.slot, ''])),
  };
}

/** Typed inputs in request units; a list field holds several values. */
export type TypedInputs = Partial<Record<FieldName, number | number[]>>;

/** The typed inputs in request units (resistance from mΩ to Ω), or null while any is unusable. */
export function readingInputs(
  definition: MethodDefinition,
  form: ReadingFormValues,
): TypedInputs | null {
  const inputs: TypedInputs = {};
  for (const field of definition.fields) {
    if (field.list) {
      const list = parseDecimalList(form.values[field.name]);
      if (list === null) return null;
      inputs[field.name] = list;
      continue;
    }
    const value = parseDecimal(form.values[field.name]);
    if (value === null) return null;
    inputs[field.name] = field.name === 'resistanceOhm' ? value / 1000 : value;
  }
  return inputs;
}

const toBaseUnit: Record<Instrument['resolutionUnit'], number> = {
  g: 1,
  mm: 1,
  ohm: 1,
  mohm: 1e-3,
  degC: 1,
};

/** The chosen instruments' resolutions, in the units the standards library expects. */
export function slotResolutions(
  definition: MethodDefinition,
  form: ReadingFormValues,
  instruments: readonly Instrument[],
): Partial<Record<ResolutionSlot, number>> {
  const result: Partial<Record<ResolutionSlot, number>> = {};
  for (const slot of definition.instruments) {
    const chosen = instruments.find((i) => String(i.id) === form.instruments[slot.slot]);
    if (chosen) result[slot.slot] = chosen.resolution * toBaseUnit[chosen.resolutionUnit];
  }
  return result;
}

export interface ReadingRequest {
  method: ReadingMethod;
  instrumentIds: number[];
  /** A UUID made on the device: a repeat is answered with the reading it recorded first. */
  clientId?: string | undefined;
  [input: string]: number | number[] | string | boolean | undefined;
}

export function toReadingRequest(
  definition: MethodDefinition,
  form: ReadingFormValues,
): ReadingRequest {
  const inputs = readingInputs(definition, form);
  if (inputs === null) throw new Error('toReadingRequest needs a valid form.');
  const instrumentIds = definition.instruments
    .map((slot) => Number(form.instruments[slot.slot]))
    .filter((id) => Number.isInteger(id) && id > 0);
  const request: ReadingRequest = { method: definition.method, instrumentIds };
  for (const [name, value] of Object.entries(inputs)) {
    if (value === undefined) continue;
    // Strand diameters travel as the list the server takes (strandDiametersMm, 1 to 10).
    if (name === 'strandDiameterMm') request.strandDiametersMm = [value].flat();
    else request[name] = value;
  }
  return request;
}
