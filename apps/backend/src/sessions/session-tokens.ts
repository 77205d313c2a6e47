import type { JwtService } from '@nestjs/jwt';
import { SESSION_HOURS, SESSION_IDLE_MINUTES, type JwtClaims } from '../auth/request-user';

/**
 * A session token: it expires after SESSION_IDLE_MINUTES unless renewed by use, and never
 * after the shift that began at `auth`.
 */
export function signSession(
  jwt: JwtService,
  user: { id: number; role: JwtClaims['role']; sessionVersion: number },
  auth = Math.floor(Date.now() / 1000),
): Promise<string> {
  const now = Math.floor(Date.now() / 1000);
  const end = Math.min(now + SESSION_IDLE_MINUTES * 60, auth + SESSION_HOURS * 3600);
  const claims: JwtClaims = { sub: user.id, role: user.role, sv: user.sessionVersion, auth };
  return jwt.signAsync(claims, { expiresIn: Math.max(1, end - now) });
}
