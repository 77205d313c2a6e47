import type { LotStatus } from '@/features/lots/types';

export { lotStatusLabels } from '@/lib/labels';

export type StatusColour = 'default' | 'info' | 'warning' | 'success' | 'error' | 'secondary';

/** Held and undecided lots stand out; accepted green, rejected red. */
export const lotStatusColours: Record<LotStatus, StatusColour> = {
  on_hold: 'warning',
  inspecting: 'info',
  awaiting_decision: 'secondary',
  accepted: 'success',
  accepted_on_concession: 'success',
  rejected: 'error',
  returned: 'default',
};
