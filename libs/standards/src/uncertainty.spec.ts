import { describe, expect, it } from 'vitest';
import {
  combinedRelative,
  component,
  coverageFactorFor,
  instrumentComponents,
  welchSatterthwaite,
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

describe('a complete budget (GUM 4.3, G.4.1; issue 13 point 3)', () => {
  it('an instrument gives resolution δ/√12, accuracy a/√3 and calibration U/2', () => {
    // a 0.2 %-of-reading meter + 2 µΩ, resolution 1 µΩ, certificate U = 3 µΩ, reading 0.78 mΩ
    const lines = instrumentComponents('resistance', 0.00078, 'Ω', -1, 1e-6, {
      accuracyPercentOfReading: 0.2,
      accuracyAbsolute: 2e-6,
      calibrationUncertainty: 3e-6,
    });
    expect(lines.map((l) => l.name)).toEqual([
      'resistance: resolution',
      'resistance: stated accuracy',
      'resistance: calibration',
    ]);
    expect(lines[0].standardUncertainty).toBeCloseTo(1e-6 / Math.sqrt(12), 15); // GUM F.2.2.1
    expect(lines[1].standardUncertainty).toBeCloseTo((0.002 * 0.00078 + 2e-6) / Math.sqrt(3), 15); // GUM 4.3.7
    expect(lines[2].standardUncertainty).toBeCloseTo(1.5e-6, 15); // certificate k = 2
  });

  it('k from Student t at 95.45 % for ν_eff (GUM Table G.2), 2 for Type B only', () => {
    expect(coverageFactorFor(1)).toBe(13.97); // GUM Table G.2
    expect(coverageFactorFor(2)).toBe(4.53); // GUM Table G.2
    expect(coverageFactorFor(3.9)).toBe(3.31); // truncated to ν = 3 (GUM G.4.1 note)
    expect(coverageFactorFor(27)).toBe(2.11); // between 25 and 30: the lower row
    expect(coverageFactorFor(100)).toBe(2.025); // GUM Table G.2
    expect(coverageFactorFor(Infinity)).toBe(2); // GUM Table G.2, ν = ∞
  });

  it('Welch–Satterthwaite: ν_eff = u⁴ / Σ uᵢ⁴/νᵢ (GUM G.4.1)', () => {
    const typeA = { ...component('spread', 1, 'mm', 0.003, 1, 'Type A'), degreesOfFreedom: 2 };
    const typeB = component('resolution', 1, 'mm', 0.004, 1, 'Type B');
    // u² = 0.003² + 0.004² = 0.005²; ν_eff = 0.005⁴ / (0.003⁴ / 2) = 2 × (5/3)⁴ = 15.43
    expect(welchSatterthwaite([typeA, typeB])).toBeCloseTo(15.432, 3);
    expect(welchSatterthwaite([typeB])).toBe(Infinity);
  });
});
