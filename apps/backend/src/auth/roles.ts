export const ROLES = ['clerk', 'qa_lead', 'purchasing', 'admin'] as const;
export type Role = (typeof ROLES)[number];
/** Every signed-in role; for routes any user of the product may call. */
export const ALL_ROLES: readonly Role[] = ROLES;
