import { parseDecimal, PASSWORD, TEXT_MAX, TEXT_MIN } from '@gaugeproof/api-types';
import { z } from 'zod';

/**
 * The contract's rules in the forms' terms (libs/api-types). Text limits (libs/api-types `TEXT_MAX`, `TEXT_MIN`, `PASSWORD`) as the
 * forms' zod arguments, so a form refuses exactly what the server refuses, in one wording:
 * `z.string().trim().max(...maxChars('reference'))`.
 */
export function maxChars(kind: keyof typeof TEXT_MAX): [number, string] {
  return [TEXT_MAX[kind], `At most ${TEXT_MAX[kind]} characters.`];
}

/** A byte limit of the contract (MAX_PHOTO_BYTES …) as people read it: "15 MB". */
export const megabytes = (bytes: number): string => `${bytes / 1024 / 1024} MB`;

/** The shortest a reason of `kind` may be, in characters. */
export const minChars = (kind: keyof typeof TEXT_MIN): number => TEXT_MIN[kind];

/** A password as the server takes it: at least 10 characters once trimmed, at most 72 bytes. */
export function passwordProblem(password: string): string | null {
  if (password.trim().length < PASSWORD.minLength)
    return `At least ${PASSWORD.minLength} characters.`;
  if (new TextEncoder().encode(password).length > PASSWORD.maxBytes)
    return `At most ${PASSWORD.maxBytes} bytes (about ${PASSWORD.maxBytes} letters without accents).`;
  return null;
}

/**
 * Typed text read as the contract's parseDecimal reads it (the reading form and the CSV
 * import: "2,5" is 2.5, "0x10" and "" are no number), then checked as a number:
 * `decimalText('Enter the amount.').pipe(z.number().min(0, ...))`.
 */
export function decimalText(message: string) {
  return z.string().transform((text, ctx) => {
    const value = parseDecimal(text);
    if (value === null) {
      ctx.addIssue({ code: 'custom', message });
      return z.NEVER;
    }
    return value;
  });
}
