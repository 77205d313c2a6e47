import { describe, expect, it } from 'vitest';
import { crossSectionGeometry } from '@/features/inspection/lib/cross-section';

describe('crossSectionGeometry', () => {
  it('draws a 4 AWG label and an 8.39 mm² measurement with areas in proportion', () => {
    const g = crossSectionGeometry(21.15, 8.392, 80);
    expect(g.labelled.radiusPx).toBeCloseTo(80, 10);
    // Drawn areas in the same ratio as real areas: (r_m / r_l)² = A_m / A_l.
    expect((g.measured.radiusPx / g.labelled.radiusPx) ** 2).toBeCloseTo(8.392 / 21.15, 10);
    // 4 AWG is 5.189 mm across (ASTM B258): r = √(21.15 / π) = 2.595 mm.
    expect(g.labelled.radiusMm).toBeCloseTo(2.595, 3);
    expect(g.pxPerMm).toBeCloseTo(80 / 2.595, 2);
  });

  it('gives the larger circle the full size when the conductor is oversize', () => {
    const g = crossSectionGeometry(8.37, 13.3, 60);
    expect(g.measured.radiusPx).toBeCloseTo(60, 10);
    expect(g.labelled.radiusPx).toBeLessThan(60);
  });

  it('picks a round scale bar no longer than the largest radius', () => {
    const g = crossSectionGeometry(21.15, 8.392, 80);
    expect(g.scaleBarMm).toBe(2);
    expect(g.scaleBarPx).toBeCloseTo(2 * g.pxPerMm, 10);
    expect(crossSectionGeometry(0.5, 0.4, 50).scaleBarMm).toBe(0.2);
  });

  it('refuses areas that cannot be drawn', () => {
    expect(() => crossSectionGeometry(0, 8, 80)).toThrow(RangeError);
    expect(() => crossSectionGeometry(21.15, Number.NaN, 80)).toThrow(RangeError);
  });
});
