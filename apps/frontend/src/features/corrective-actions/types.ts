import type { CorrectiveActionStatus } from '@gaugeproof/api-types';
/** Supplier corrective action request (SCAR): the contract's enum and shape (libs/api-types). */
export {
  CAR_STATUSES,
  type CorrectiveAction,
  type CorrectiveActionStatus,
} from '@gaugeproof/api-types';

export const carStatusLabels: Record<CorrectiveActionStatus, string> = {
  open: 'Open',
  responded: 'Responded',
  verified: 'Verified',
  reopened: 'Reopened',
  closed: 'Closed',
};
