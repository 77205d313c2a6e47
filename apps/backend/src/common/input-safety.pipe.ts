import { Injectable, type ArgumentMetadata, type PipeTransform } from '@nestjs/common';
import { DomainError, type FieldError } from './domain-error';

/**
 * C0 control characters but tab, line feed and carriage return, and DEL (Unicode "Cc"):
 * no field of ours holds them, PostgreSQL refuses NUL in text outright (a 500 found by
 * the odd-input test), and they hide text in CSV, mail and PDFs.
 */
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;
/** Half of a surrogate pair alone: not a character, and not storable as UTF-8. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/**
 * Numbers any field of ours may hold: magnitudes from 1e-12 to 1e15, or 0 (our choice: no
 * quantity, cost, reading or id is outside). Past them JavaScript numbers print in exponent
 * notation, which class-validator's decimal-places check cannot read: a quantity of 5e-324
 * threw inside validation (a 500 found by the odd-input test).
 */
export const MIN_MAGNITUDE = 1e-12;
export const MAX_MAGNITUDE = 1e15;
const EXPONENT_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)e[+-]?\d+$/i;

function outOfRange(n: number): boolean {
  const m = Math.abs(n);
  return Number.isFinite(n) && m !== 0 && (m < MIN_MAGNITUDE || m > MAX_MAGNITUDE);
}

/**
 * The first problem in `value`, on the path of the field that has it (`conductors.0.gauge`,
 * as the validation pipe names nested properties; null for the body itself).
 */
export function textProblem(value: unknown, name: string): FieldError | null {
  const at = (path: string, message: string): FieldError => ({
    field: path || null,
    message,
  });
  const stack: [unknown, string][] = [[value, name]];
  while (stack.length > 0) {
    const [v, path] = stack.pop()!;
    if (typeof v === 'string') {
      if (CONTROL.test(v)) {
        return at(
          path,
          `${path} must not contain control characters (tab and line breaks are allowed)`,
        );
      }
      if (LONE_SURROGATE.test(v)) {
        return at(path, `${path} is not valid text (it holds a broken character)`);
      }
      if (EXPONENT_NUMBER.test(v.trim()) && outOfRange(Number(v))) {
        return at(
          path,
          `${path} must be 0 or a number from ${MIN_MAGNITUDE} to ${MAX_MAGNITUDE} in size`,
        );
      }
    } else if (typeof v === 'number') {
      if (outOfRange(v)) {
        return at(
          path,
          `${path} must be 0 or a number from ${MIN_MAGNITUDE} to ${MAX_MAGNITUDE} in size`,
        );
      }
    } else if (v !== null && typeof v === 'object') {
      for (const [k, child] of Object.entries(v as Record<string, unknown>)) {
        if (CONTROL.test(k) || LONE_SURROGATE.test(k)) {
          return at(path, `${path || 'body'} has a field name that is not valid text`);
        }
        const childPath = path ? `${path}.${k}` : k;
        stack.push([child, childPath]);
      }
    }
  }
  return null;
}

/**
 * Refuses, with 400 on the field (`errors: [{field, message}]`), any body field, query parameter or path parameter
 * holding a control character, a lone surrogate or a number outside MIN/MAX_MAGNITUDE, before validation and before any of it
 * reaches the database. A global pipe, placed first.
 */
@Injectable()
export class InputSafetyPipe implements PipeTransform {
  transform(value: unknown, meta: ArgumentMetadata): unknown {
    if (meta.type === 'custom') return value;
    const problem = textProblem(value, meta.type === 'body' ? '' : (meta.data ?? ''));
    if (problem) throw DomainError.invalid([problem]);
    return value;
  }
}
