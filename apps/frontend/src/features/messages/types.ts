import { MESSAGE_STATUSES, type MessageStatus } from '@gaugeproof/api-types';
/** OutboundMessage as GET /api/messages shows it: the contract's enum and shape. */
export { MESSAGE_STATUSES, type MessageStatus };
export type { OutboundMessage } from '@gaugeproof/api-types';
