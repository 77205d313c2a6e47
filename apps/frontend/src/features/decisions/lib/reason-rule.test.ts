import { describe, expect, it } from 'vitest';
import {
  MIN_REASON_LENGTH,
  reasonError,
  reasonRequired,
} from '@/features/decisions/lib/reason-rule';

describe('the reason rule of a decision', () => {
  it('leaves the reason optional when the outcome follows the recommendation', () => {
    expect(reasonRequired('accept', 'accept')).toBe(false);
    expect(reasonRequired('reject', 'reject')).toBe(false);
    expect(reasonError('reject', 'reject', '')).toBeNull();
  });

  it('asks for a reason against the recommendation, for a concession and on incomplete', () => {
    expect(reasonRequired('reject', 'accept')).toBe(true);
    expect(reasonRequired('accept', 'reject')).toBe(true);
    expect(reasonRequired('accept_on_concession', 'reject')).toBe(true);
    expect(reasonRequired('accept_on_concession', 'accept')).toBe(true);
    expect(reasonRequired('reject', 'incomplete')).toBe(true);
  });

  it('counts trimmed characters against the minimum of 20', () => {
    expect(MIN_REASON_LENGTH).toBe(20);
    const nineteen = 'x'.repeat(19);
    expect(reasonError('reject', 'accept', `  ${nineteen}   `)).toBe(
      'This goes against the recommendation (accept): give a reason of at least 20 characters (19 so far).',
    );
    expect(reasonError('reject', 'accept', `${nineteen}y`)).toBeNull();
    expect(reasonError('accept_on_concession', 'reject', 'short')).toMatch(
      /^A concession needs a reason of at least 20 characters \(5 so far\)/,
    );
  });

  it('caps any reason at 4000 characters', () => {
    expect(reasonError('accept', 'accept', 'x'.repeat(4001))).toBe('At most 4000 characters.');
  });
});
