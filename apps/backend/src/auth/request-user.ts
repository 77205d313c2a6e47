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
}

export const SESSION_COOKIE = 'gp_session';
/** One working shift. */
export const SESSION_HOURS = 10;
