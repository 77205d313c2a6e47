import { describe, expect, it } from 'vitest';
import { areaFromDiameter } from './diameter.js';

describe('areaFromDiameter (solid conductor, A = π d² / 4)', () => {
  it('a solid 14 AWG (1.628 mm) is 2.08 mm² (ASTM B258; NEC Ch. 9 Table 8)', () => {
    const r = areaFromDiameter({ diameterMm: 1.628 });
    expect(r.areaMm2).toBeCloseTo(2.08, 2);
    // u_rel = 2 · (0.001/√12) / 1.628 (GUM F.2.2.1, §5.1.6)
    expect(r.uMm2 / r.areaMm2).toBeCloseTo((2 * 0.001) / Math.sqrt(12) / 1.628, 12);
  });

  it('averages readings at right angles and grows with a coarser caliper', () => {
    const r = areaFromDiameter({ diameterMm: [2.58, 2.596] });
    expect(r.areaMm2).toBeCloseTo((Math.PI / 4) * 2.588 ** 2, 10); // 10 AWG 2.588 mm (ASTM B258)
    const caliper = areaFromDiameter({ diameterMm: 2.588, diameterResolutionMm: 0.01 });
    const micrometer = areaFromDiameter({ diameterMm: 2.588, diameterResolutionMm: 0.001 });
    expect(caliper.uMm2).toBeGreaterThan(micrometer.uMm2);
  });
});
