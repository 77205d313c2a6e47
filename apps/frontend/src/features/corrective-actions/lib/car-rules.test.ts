import { describe, expect, it } from 'vitest';
import {
  allowedTransitions,
  awaitingResponse,
  statusCommands,
  todayIso,
} from '@/features/corrective-actions/lib/car-rules';
import { CAR_STATUSES } from '@/features/corrective-actions/types';

describe('corrective action transitions', () => {
  it('follows open → responded → verified | reopened → closed', () => {
    expect(allowedTransitions('open')).toEqual(['responded']);
    expect(allowedTransitions('responded')).toEqual(['verified', 'reopened']);
    expect(allowedTransitions('reopened')).toEqual(['responded']);
    expect(allowedTransitions('verified')).toEqual(['closed']);
    expect(allowedTransitions('closed')).toEqual([]);
  });

  it('never allows staying put, going back to open or skipping verification', () => {
    for (const s of CAR_STATUSES) {
      expect(allowedTransitions(s)).not.toContain(s);
      expect(allowedTransitions(s)).not.toContain('open');
    }
    expect(allowedTransitions('open')).not.toContain('closed');
    expect(allowedTransitions('responded')).not.toContain('closed');
  });

  it('offers the response as a form, not a bare status button', () => {
    expect(statusCommands('open')).toEqual([]);
    expect(statusCommands('responded')).toEqual(['verified', 'reopened']);
    expect(statusCommands('reopened')).toEqual([]);
  });
});

describe('awaiting the supplier', () => {
  it('is an open or reopened request: only those can be overdue', () => {
    expect(CAR_STATUSES.filter(awaitingResponse)).toEqual(['open', 'reopened']);
  });

  it('reads today in the local calendar, for the earliest due date', () => {
    expect(todayIso(new Date(2026, 0, 5, 23, 30))).toBe('2026-01-05');
    expect(todayIso(new Date(2026, 11, 31, 0, 5))).toBe('2026-12-31');
  });
});
