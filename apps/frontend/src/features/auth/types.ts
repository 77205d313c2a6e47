import type { Role } from '@/lib/roles';

/** The signed-in user as the server describes it (`GET /api/auth/me`). */
export interface SessionUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}
