import { describe, expect, it } from 'vitest';
import {
  combinedRelative,
  component,
  meanUncertainty,
  resolutionUncertainty,
  toleranceUncertainty,
} from './uncertainty.js';

describe('uncertainty (JCGM 100:2008 GUM)', () => {
  it('a resolution δ gives δ/√12 (GUM F.2.2.1)', () => {
    expect(resolutionUncertainty(0.1)).toBeCloseTo(0.028868, 6);
    expect(resolutionUncertainty(1)).toBeCloseTo(0.288675, 6);
  });

  it('a tolerance ±a gives a/√3 (GUM 4.3.7)', () => {
    expect(toleranceUncertainty(0.1)).toBeCloseTo(0.057735, 6);
  });

  it('the mean of readings has s/√n (GUM 4.2.3)', () => {
    // readings 1, 2, 3: s = 1, n = 3 → 1/√3
    expect(meanUncertainty([1, 2, 3])).toBeCloseTo(1 / Math.sqrt(3), 12);
    expect(meanUncertainty([2])).toBe(0);
  });

  it('combines relative contributions of a product model by root sum of squares (GUM §5.1.6)', () => {
    const budget = [component('x', 10, 'g', 0.3, 1, ''), component('y', 5, 'mm', 0.2, -2, '')];
    // (1 · 0.3/10)² + (2 · 0.2/5)² = 0.0009 + 0.0064
    expect(combinedRelative(budget)).toBeCloseTo(Math.sqrt(0.0073), 12);
    expect(budget[1].relativeContribution).toBeCloseTo(0.08, 12);
  });
});
