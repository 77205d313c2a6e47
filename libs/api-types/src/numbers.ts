/**
 * How typed text becomes a number, the same in the reading form and the CSV import: a plain
 * decimal with an optional sign, a decimal point or comma and an optional exponent
 * ("76.1", "76,1", "-3", "+0.5", "2.5e-3"). Anything else ("0x10", "1_000", "Infinity",
 * "12 mm", "") is not a number.
 */
const DECIMAL = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;

/** The number a cell or a form field holds, or null when it is not a plain decimal number. */
export function parseDecimal(text: string | null | undefined): number | null {
  const trimmed = (text ?? '').trim().replace(',', '.');
  if (!DECIMAL.test(trimmed)) return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
}

/**
 * "0.253 0.254; 0,255" → [0.253, 0.254, 0.255]: parts separated by spaces or ";" (a comma
 * may be a decimal comma). Null when there is no part or any part is not a number.
 */
export function parseDecimalList(text: string | null | undefined): number[] | null {
  const parts = (text ?? '')
    .trim()
    .split(/[\s;]+/)
    .filter(Boolean);
  if (parts.length === 0) return null;
  const values = parts.map(parseDecimal);
  return values.every((v) => v !== null) ? (values as number[]) : null;
}
