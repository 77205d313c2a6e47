import { NOTICE_SWITCHES, type NoticeSwitch } from '@gaugeproof/api-types';
import type { Role } from '../auth/roles';
import type { NoticeKind } from './entities/notice.entity';

/** The switches of a user's notices, as stored and as the profile page sends them. */
export { NOTICE_SWITCHES, type NoticeSwitch };

export type NoticeChoices = Record<NoticeSwitch, boolean> & { digest: boolean };

/** Who each notice is for; an admin gets any they switch on. */
export const AUDIENCE: Record<NoticeSwitch, readonly Role[]> = {
  lotAwaitsDecision: ['qa_lead'],
  lotRejectNumber: ['qa_lead'],
  lotRejected: ['purchasing'],
  scarOverdue: ['purchasing'],
  scarAnswered: ['purchasing'],
  // Whoever may approve it: another QA lead or an admin (never its requester).
  concessionAwaitsApproval: ['qa_lead', 'admin'],
};

export const SWITCH_OF: Record<NoticeKind, NoticeSwitch> = {
  lot_awaits_decision: 'lotAwaitsDecision',
  lot_reject_number: 'lotRejectNumber',
  lot_rejected: 'lotRejected',
  scar_overdue: 'scarOverdue',
  scar_answered: 'scarAnswered',
  concession_awaits_approval: 'concessionAwaitsApproval',
};

/** The notices a role is offered on its profile page. */
export function offeredTo(role: Role): NoticeSwitch[] {
  return NOTICE_SWITCHES.filter((s) => role === 'admin' || AUDIENCE[s].includes(role));
}

/** Before a user changes anything: their role's notices on, one e-mail each. */
export function defaultChoices(role: Role): NoticeChoices {
  const choices = { digest: false } as NoticeChoices;
  for (const s of NOTICE_SWITCHES) choices[s] = AUDIENCE[s].includes(role);
  return choices;
}
