import { ROLES, type Role } from '@gaugeproof/api-types';
/** The roles are the contract's (libs/api-types). */
export { ROLES, type Role };

export const roleLabels: Record<Role, string> = {
  clerk: 'Receiving clerk',
  qa_lead: 'QA lead',
  purchasing: 'Purchasing',
  admin: 'Administrator',
};

/** What each role does in Gaugeproof, in the words of the trade. */
export const roleDuties: Record<Role, readonly string[]> = {
  clerk: [
    'Log each delivery against its purchase order and put the lot on hold.',
    'Cut and strip the samples the sampling plan asks for.',
    'Record weights, lengths and other readings, and upload photos of the evidence.',
    'Void their own reading or photo, with a reason, until the lot is decided.',
    'Read the instrument register; cannot decide lots, change suppliers or products.',
  ],
  qa_lead: [
    'Review the evidence for each lot and decide: accept, accept on concession or reject.',
    'Void any wrong reading or photo with a reason; it stays visible in the history.',
    'Receive deliveries and record readings like a clerk.',
    'Keep the instrument register and the acceptance policy.',
  ],
  purchasing: [
    'Review supplier scorecards built from inspection results.',
    'Raise returns to vendor and corrective-action requests.',
    'Export evidence and e-mail suppliers; add and edit suppliers and products.',
    'Cannot record readings or decide lots.',
  ],
  admin: [
    'Manage users and their roles, and the settings.',
    'Read the audit trail of every change and export it.',
    'Do anything any other role can do.',
  ],
};
