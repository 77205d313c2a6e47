/** The signed-in user as the server describes it (`GET /api/auth/me`): the contract's shape. */
export type { SessionUser } from '@gaugeproof/api-types';
