import { z } from 'zod';
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

/** "76.1" or "76,1" → 76.1; anything that is not a plain decimal number → null. */
export function parseDecimal(text: string | undefined): number | null {
  const trimmed = (text ?? '').trim().replace(',', '.');
  if (!/^-?(\d+\.?\d*|\.\d+)(e-?\d+)?$/i.test(trimmed)) return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
}

/** "0.253 0.254; 0,255" → [0.253, 0.254, 0.255]; null when any part is not a number. */
export function parseDecimalList(text: string | undefined): number[] | null {
  const parts = (text ?? '')
    .trim()
    .split(/[\s;]+/)
    .filter(Boolean);
  if (parts.length === 0) return null;
  const values = parts.map(parseDecimal);
  return values.every((v) => v !== null) ? (values as number[]) : null;
}

/** Strand readings a sample may carry: 1 to 10 (issue 13; the server's limit). */
const MAX_LIST_VALUES = 10;

function listSchema(field: InputField) {
  return z.string().superRefine((text, ctx) => {
    const values = parseDecimalList(text);
    if (text.trim() === '') {
      ctx.addIssue({ code: 'custom', message: `Enter the ${field.label.toLowerCase()}.` });
    } else if (values === null) {
      ctx.addIssue({
        code: 'custom',
        message: `Enter numbers in ${field.unit}, separated by spaces.`,
      });
    } else if (values.length > MAX_LIST_VALUES) {
      ctx.addIssue({ code: 'custom', message: `Enter at most ${MAX_LIST_VALUES} values.` });
    } else if (values.some((v) => v <= 0)) {
      ctx.addIssue({ code: 'custom', message: 'Each must be greater than 0.' });
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
    } else if (field.allowNonPositive ? value < -40 || value > 150 : value <= 0) {
      ctx.addIssue({
        code: 'custom',
        // -40…150 °C: a plausibility bound for a bench reading (common practice, no source).
        message: field.allowNonPositive
          ? 'Enter a temperature from -40 to 150 °C.'
          : 'Must be greater than 0.',
      });
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
