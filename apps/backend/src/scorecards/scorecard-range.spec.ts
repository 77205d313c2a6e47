import { describe, expect, it } from 'vitest';
import { defaultRange, monthBuckets, resolveRange } from './scorecard-range';

describe('resolveRange', () => {
  it('ends at midnight UTC after `to`, so the whole `to` day counts', () => {
    const r = resolveRange('2025-01-01', '2025-03-31');
    expect(r.start.toISOString()).toBe('2025-01-01T00:00:00.000Z');
    expect(r.end.toISOString()).toBe('2025-04-01T00:00:00.000Z');
    expect(r.months.map((m) => m.month)).toEqual(['2025-01', '2025-02', '2025-03']);
  });

  it('clips the first and last month to the range', () => {
    const [first, last] = monthBuckets(
      new Date('2025-01-15T00:00:00Z'),
      new Date('2025-02-11T00:00:00Z'),
    );
    expect(first.start.toISOString()).toBe('2025-01-15T00:00:00.000Z');
    expect(first.end.toISOString()).toBe('2025-02-01T00:00:00.000Z');
    expect(last.end.toISOString()).toBe('2025-02-11T00:00:00.000Z');
  });

  it('defaults to 12 calendar months ending today', () => {
    expect(defaultRange(new Date('2026-12-01T22:00:00Z'))).toEqual({
      from: '2026-01-01',
      to: '2026-12-01',
    });
    expect(
      resolveRange(undefined, undefined, new Date('2026-03-15T00:00:00Z')).months,
    ).toHaveLength(12);
  });

  it('refuses impossible dates, reversed ranges and more than 60 months', () => {
    expect(() => resolveRange('2025-02-29', '2025-03-01')).toThrow();
    expect(() => resolveRange('2025-03-02', '2025-03-01')).toThrow();
    expect(() => resolveRange('2020-01-01', '2025-01-01')).toThrow();
    expect(resolveRange('2021-01-01', '2025-12-31').months).toHaveLength(60);
  });

  it('counts twelve calendar months back from a `to` given alone, as from today', () => {
    const r = resolveRange(undefined, '2026-12-03');
    expect(r.from).toBe('2026-01-01');
    expect(r.months.map((m) => m.month)).toEqual([
      '2026-01',
      '2026-02',
      '2026-03',
      '2026-04',
      '2026-05',
      '2026-06',
      '2026-07',
      '2026-08',
      '2026-09',
      '2026-10',
      '2026-11',
      '2026-12',
    ]);
    expect(resolveRange(undefined, '2026-03-31').from).toBe('2025-04-01');
    expect(
      resolveRange(undefined, undefined, new Date('2026-12-03T10:00:00Z')).months,
    ).toHaveLength(12);
  });
});
