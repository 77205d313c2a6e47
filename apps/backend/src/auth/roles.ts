import { ROLES, type Role } from '@gaugeproof/api-types';

// The values are the contract's (libs/api-types), used here and re-exported for this module.
export { ROLES, type Role };
/** Every signed-in role; for routes any user of the product may call. */
export const ALL_ROLES: readonly Role[] = ROLES;
