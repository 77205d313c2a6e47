import type { Role } from './roles';

export interface RequestUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

export interface JwtClaims {
  sub: number;
  role: Role;
  /** The account's session version when signed in (users.session_version). */
  sv: number;
  /** When the person signed in (seconds since the epoch); the session ends SESSION_HOURS later. */
  auth: number;
  /** Set by jsonwebtoken: when this token was issued (seconds). */
  iat?: number;
}

export const SESSION_COOKIE = 'gp_session';
/** One working shift: no session lasts longer, active or not. */
export const SESSION_HOURS = 10;
/**
 * A session unused this long ends (OWASP Session Management Cheat Sheet: 15 to 30 minutes
 * of idle time for applications of low to medium risk).
 */
export const SESSION_IDLE_MINUTES = 30;
/** A cookie session in use gets a fresh token at most this often (our choice). */
export const SESSION_REFRESH_SECONDS = 60;
