/** An account as the server sends it: the contract's shape (libs/api-types). */
export type { User } from '@gaugeproof/api-types';
