import { createHash, createHmac, randomBytes, timingSafeEqual } from 'node:crypto';

/** How long a supplier's link works unless revoked (issue 14: 30 days). */
export const LINK_DAYS = 30;
export const DAY_MS = 86_400_000;

export const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

function sign(secret: string, random: string): string {
  return createHmac('sha256', secret).update(`supplier-link:${random}`).digest('base64url');
}

/** A new link token, `<random>.<HMAC>`; store only `sha256(token)`. */
export function newPortalToken(secret: string): string {
  const random = randomBytes(24).toString('base64url');
  return `${random}.${sign(secret, random)}`;
}

/** Whether the token carries our signature (checked before any database look-up). */
export function signedByUs(secret: string, token: string): boolean {
  const [random, signature, extra] = token.split('.');
  if (extra !== undefined || !random) return false;
  const expected = Buffer.from(sign(secret, random));
  const given = Buffer.from(signature ?? '');
  return expected.length === given.length && timingSafeEqual(expected, given);
}
