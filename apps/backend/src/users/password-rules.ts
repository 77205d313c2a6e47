import { PASSWORD } from '@gaugeproof/api-types';
import { ValidateBy, type ValidationOptions } from 'class-validator';

/** At least this many characters once leading and trailing spaces are gone (the contract's PASSWORD). */
export const MIN_PASSWORD_CHARS = PASSWORD.minLength;
/** bcrypt reads only the first 72 bytes of a password (the contract's PASSWORD). */
export const MAX_PASSWORD_BYTES = PASSWORD.maxBytes;

/**
 * Passwords too common to allow (NIST SP 800-63B 5.1.1.2: refuse values from lists of
 * commonly used or compromised passwords). A short list of the usual long ones, from
 * memory, plus this product's demo password.
 */
const COMMON = new Set([
  '1234567890',
  '0123456789',
  '12345678910',
  '123456789012',
  '0987654321',
  'qwertyuiop',
  'qwerty1234',
  '1234qwerty',
  'asdfghjkl;',
  'password12',
  'password123',
  'password1234',
  'passw0rd123',
  'iloveyou12',
  'abcdefghij',
  'abc1234567',
  'letmein123',
  'welcome123',
  'changeme123',
  'administrator',
  'gaugeproof',
  'gaugeproof-demo',
]);

/** Why a password is refused, or null. */
export function passwordProblem(value: unknown): string | null {
  if (typeof value !== 'string') return 'password must be text';
  const trimmed = value.trim();
  if ([...trimmed].length < MIN_PASSWORD_CHARS) {
    return `password must be at least ${MIN_PASSWORD_CHARS} characters, not counting spaces at either end`;
  }
  if (Buffer.byteLength(value, 'utf8') > MAX_PASSWORD_BYTES) {
    return `password must be at most ${MAX_PASSWORD_BYTES} bytes (bcrypt ignores the rest); use fewer or plainer characters`;
  }
  if (/^(.)\1*$/u.test(trimmed) || COMMON.has(trimmed.toLowerCase())) {
    return 'password is too common or too simple; choose another';
  }
  return null;
}

/** A password the rules above accept (one message whatever is wrong). */
export function IsAcceptablePassword(options: ValidationOptions = {}) {
  return ValidateBy(
    {
      name: 'isAcceptablePassword',
      validator: {
        validate: (value: unknown) => passwordProblem(value) === null,
        defaultMessage: (args) => passwordProblem(args?.value) ?? 'password is not acceptable',
      },
    },
    options,
  );
}
