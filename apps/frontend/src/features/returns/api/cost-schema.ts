import { z } from 'zod';
import { RETURN_AMOUNTS } from '@gaugeproof/api-types';
import type { ReturnCosts } from '@/features/returns/types';

/** A typed amount: empty, or a number ≥ 0 with at most 2 decimals and at most `max`. */
const amount = (max: number) =>
  z
    .string()
    .trim()
    .refine((v) => v === '' || /^\d+(\.\d{1,2})?$/.test(v), 'A number ≥ 0 with at most 2 decimals.')
    .refine((v) => v === '' || Number(v) <= max, `At most ${max}.`);

// The contract's limits (RETURN_AMOUNTS), as the server's ReturnCostsDto.
export const costsSchema = z.object({
  inspectionHours: amount(RETURN_AMOUNTS.inspectionHours.max),
  hourlyRate: amount(RETURN_AMOUNTS.hourlyRate.max),
  freight: amount(RETURN_AMOUNTS.freight.max),
  other: amount(RETURN_AMOUNTS.other.max),
});
export type CostsForm = z.infer<typeof costsSchema>;
export const COST_FIELDS = ['inspectionHours', 'hourlyRate', 'freight', 'other'] as const;

export const emptyCosts: CostsForm = {
  inspectionHours: '',
  hourlyRate: '',
  freight: '',
  other: '',
};

/** The typed costs as the API takes them: only the fields given, as numbers. */
export function costsFromForm(form: Partial<CostsForm>): ReturnCosts {
  const out: ReturnCosts = {};
  for (const k of COST_FIELDS) {
    const v = form[k]?.trim() ?? '';
    if (v !== '' && Number.isFinite(Number(v))) out[k] = Number(v);
  }
  return out;
}

export function costsToForm(costs: ReturnCosts): CostsForm {
  const text = (v: number | undefined) => (v === undefined ? '' : String(v));
  return {
    inspectionHours: text(costs.inspectionHours),
    hourlyRate: text(costs.hourlyRate),
    freight: text(costs.freight),
    other: text(costs.other),
  };
}
