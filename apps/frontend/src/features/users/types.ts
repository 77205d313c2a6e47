import type { Role } from '@/lib/roles';

export interface User {
  id: number;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  /** ISO date-time. */
  createdAt: string;
  /** The edit version: an edit names it, and a stale one is answered 409. */
  version: number;
}
