import { MAX_RANGE_MONTHS } from '@gaugeproof/api-types';
import { z } from 'zod';
import type { DateRange } from '@/features/scorecards/types';

/** The server answers at most this many calendar months: the contract's limit. */
export { MAX_RANGE_MONTHS };

export const RANGE_PRESETS = [3, 6, 12] as const;
export type RangePreset = (typeof RANGE_PRESETS)[number];

const pad = (n: number) => String(n).padStart(2, '0');
const iso = (d: Date) => `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;

/** Last `months` calendar months, this month included, up to `today` (the server's default rule). */
export function presetRange(months: number, today = new Date()): DateRange {
  const from = new Date(today.getFullYear(), today.getMonth() - (months - 1), 1);
  return { from: iso(from), to: iso(today) };
}

/** Which preset a range is, if any (for highlighting the preset button). */
export function presetOf(range: DateRange, today = new Date()): RangePreset | null {
  return (
    RANGE_PRESETS.find((m) => {
      const p = presetRange(m, today);
      return p.from === range.from && p.to === range.to;
    }) ?? null
  );
}

function isCalendarDate(value: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(value)) return false;
  const t = Date.parse(`${value}T00:00:00Z`);
  return Number.isFinite(t) && new Date(t).toISOString().slice(0, 10) === value;
}

function monthsSpanned(range: DateRange): number {
  const [fy, fm] = range.from.split('-').map(Number);
  const [ty, tm] = range.to.split('-').map(Number);
  return (ty - fy) * 12 + (tm - fm) + 1;
}

const date = (name: string) =>
  z.string().refine(isCalendarDate, `${name} must be a real date (YYYY-MM-DD)`);

/** The same checks the server makes, so a bad range is caught as it is typed. */
export const dateRangeSchema = z
  .object({ from: date('From'), to: date('To') })
  .refine((r) => r.from <= r.to, { message: 'From must be on or before To', path: ['to'] })
  .refine((r) => monthsSpanned(r) <= MAX_RANGE_MONTHS, {
    message: `A range may span at most ${MAX_RANGE_MONTHS} calendar months`,
    path: ['from'],
  });

/** The range from URL parameters, falling back to the last 12 months when absent or bad. */
export function rangeFromParams(from: string | null, to: string | null, today = new Date()) {
  const parsed = dateRangeSchema.safeParse({ from, to });
  return parsed.success ? parsed.data : presetRange(12, today);
}
