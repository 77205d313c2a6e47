import { describe, expect, it } from 'vitest';
import { assessSample } from './assess-sample.js';
import { parseGauge } from './gauges/parse.js';
import { areaFromMass } from './methods/mass.js';

describe('assessSample (ILAC-G8:09/2019 §4.2 guard bands; ASTM B496 98 %)', () => {
  it('a "4 AWG" copper sample weighing 76.1 g over 1 m is nonconforming and measures as 8 AWG (issue 3)', () => {
    const area = areaFromMass({
      massG: 76.1,
      lengthMm: 1000,
      material: 'copper',
      strandingIncrement: 0.02,
    });
    const r = assessSample({
      gauge: '4 AWG',
      claimedMaterial: 'copper',
      areaMm2: area.areaMm2,
      UMm2: area.UMm2,
    });
    expect(r.verdict).toBe('nonconforming');
    expect(r.measuresAs.label).toBe('8 AWG'); // 8.3923 ≥ 0.98 × 8.367 (ASTM B258; B496)
    expect(r.areaRatio).toBeCloseTo(8.3923 / 21.15, 4); // ≈ 0.40 of 21.15 mm² (ASTM B258)
    expect(r.reasons[0]).toBe('Measures as 8 AWG: 39.7 % of the copper a 4 AWG label promises.');
    expect(r.consequence?.treatAs).toBe('8 AWG');
    expect(r.consequence?.text).toMatch(/^Treat as 8 AWG for fusing and voltage drop/);
    expect(r.minimumAreaMm2).toBeCloseTo(0.98 * 21.15, 10);
    expect(r.lengthForConclusiveMm).toBeUndefined();
  });

  it('conforms only when A − U reaches the minimum', () => {
    const gauge = parseGauge('4 AWG'); // 21.15 mm², minimum 20.727 (ASTM B258; ASTM B496)
    expect(
      assessSample({ gauge, claimedMaterial: 'copper', areaMm2: 21.0, UMm2: 0.2 }).verdict,
    ).toBe('conforms');
    expect(
      assessSample({ gauge, claimedMaterial: 'copper', areaMm2: 20.727 + 0.1, UMm2: 0.1 }).verdict,
    ).toBe('conforms');
    expect(
      assessSample({ gauge, claimedMaterial: 'copper', areaMm2: 20.5, UMm2: 0.2 }).verdict,
    ).toBe('nonconforming');
    expect(
      assessSample({ gauge, claimedMaterial: 'copper', areaMm2: 20.8, UMm2: 0.2 }).verdict,
    ).toBe('inconclusive');
  });

  it('says how long a sample would decide an inconclusive result (U ∝ 1/L)', () => {
    const r = assessSample({
      gauge: '4 AWG',
      claimedMaterial: 'copper',
      areaMm2: 20.8,
      UMm2: 0.2,
      sampleLengthMm: 300,
    });
    expect(r.verdict).toBe('inconclusive');
    // 300 mm × 0.2 / (20.8 − 20.727) = 821.9 mm, rounded up to 10 mm
    expect(r.lengthForConclusiveMm).toBe(830);
    expect(r.reasons.join(' ')).toMatch(/830 mm/);
    const assumed = assessSample({
      gauge: '4 AWG',
      claimedMaterial: 'copper',
      areaMm2: 20.8,
      UMm2: 0.2,
    });
    expect(assumed.lengthForConclusiveMm).toBe(2740); // 1000 × 0.2 / 0.073 = 2739.7
    expect(assumed.reasons.join(' ')).toMatch(/1 m sample/);
  });

  it('a longer specimen of the same cable really decides it (mass method)', () => {
    // 4 AWG copper just above the minimum, weighed over 50 mm on a 0.1 g balance
    const massPerMm = (8.89 / 1000) * 20.75 * 1.02;
    const short = areaFromMass({ massG: massPerMm * 50, lengthMm: 50 });
    const first = assessSample({
      gauge: '4 AWG',
      claimedMaterial: 'copper',
      areaMm2: short.areaMm2,
      UMm2: short.UMm2,
      sampleLengthMm: 50,
    });
    expect(first.verdict).toBe('inconclusive');
    const L = first.lengthForConclusiveMm as number;
    const long = areaFromMass({ massG: massPerMm * L, lengthMm: L });
    expect(
      assessSample({
        gauge: '4 AWG',
        claimedMaterial: 'copper',
        areaMm2: long.areaMm2,
        UMm2: long.UMm2,
      }).verdict,
    ).toBe('conforms');
  });

  it('copper found to be CCA or aluminium is nonconforming whatever its area', () => {
    for (const found of ['cca', 'aluminium'] as const) {
      const r = assessSample({
        gauge: '4 AWG',
        claimedMaterial: 'copper',
        areaMm2: 30,
        UMm2: 0.1,
        identifiedMaterial: found,
      });
      expect(r.verdict).toBe('nonconforming');
      expect(r.materialCheck).toBe('not_as_claimed');
      expect(r.reasons[0]).toMatch(/^Sold as copper but the readings show/);
    }
    const tinned = assessSample({
      gauge: '4 AWG',
      claimedMaterial: 'tinned_copper',
      areaMm2: 21.2,
      UMm2: 0.1,
      identifiedMaterial: 'copper',
    });
    expect(tinned.verdict).toBe('conforms');
    const cca = assessSample({
      gauge: '4 AWG',
      claimedMaterial: 'cca15',
      areaMm2: 21.2,
      UMm2: 0.1,
      identifiedMaterial: 'cca',
    });
    expect(cca.verdict).toBe('conforms');
    expect(cca.reasons[0]).toMatch(/conductor area/);
  });

  it('inconsistent readings are inconclusive with a request to re-check', () => {
    const r = assessSample({
      gauge: '4 AWG',
      claimedMaterial: 'copper',
      areaMm2: 21.2,
      UMm2: 0.1,
      identifiedMaterial: 'inconsistent',
    });
    expect(r.verdict).toBe('inconclusive');
    expect(r.reasons[0]).toMatch(/typo/);
  });

  it('honours a per-product minimum and metric labels', () => {
    const r = assessSample({
      gauge: '25 mm²',
      claimedMaterial: 'copper',
      areaMm2: 24,
      UMm2: 0.1,
      minAreaRatio: 0.95,
    });
    // metric copper is judged by resistance (IEC 60228): 0.017241 × 1.02 × 1000 / 24 = 0.7327 Ω/km
    // against 0.780 Ω/km (IEC 60228 Table 3, class 5 plain): 93.9 % of the maximum
    expect(r.verdict).toBe('conforms');
    expect(r.criterion).toBe('resistance');
    expect(r.measuresAs.label).toBe('25 mm²');
    expect(r.reasons[0]).toBe(
      'Measures as 25 mm²: resistance 93.9 % of the maximum a 25 mm² class 5 conductor may have.',
    );
    const an = assessSample({
      gauge: '8 AWG',
      claimedMaterial: 'copper',
      areaMm2: 5.3,
      UMm2: 0.01,
    });
    expect(an.reasons[0]).toBe('Measures as 10 AWG: 63.3 % of the copper an 8 AWG label promises.');
  });
});
