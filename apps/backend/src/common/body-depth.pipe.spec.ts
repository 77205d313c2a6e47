import { describe, expect, it } from 'vitest';
import { jsonDepth } from './body-depth.pipe';

describe('jsonDepth', () => {
  it('measures plain values, objects and arrays', () => {
    expect(jsonDepth(1)).toBe(0);
    expect(jsonDepth(null)).toBe(0);
    expect(jsonDepth({})).toBe(1);
    expect(jsonDepth({ a: [1, { b: 2 }] })).toBe(3);
  });

  it('measures a very deep document without overflowing', () => {
    let v: unknown = 1;
    for (let i = 0; i < 100_000; i++) v = [v];
    expect(jsonDepth(v)).toBe(100_000);
    expect(jsonDepth(v, 16)).toBe(17);
  });
});
