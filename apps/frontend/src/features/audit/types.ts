/** An audit event as timelines show it: the contract's shape (libs/api-types). */
export type { TimelineEvent } from '@gaugeproof/api-types';
