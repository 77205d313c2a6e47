import { describe, expect, it } from 'vitest';
import { questionReading } from './plausibility.js';

describe('plausibility questions (issue 13 point 4)', () => {
  it('a mass ten times too high asks about a decimal point', () => {
    const q = questionReading({ method: 'mass', nominalAreaMm2: 21.15, areaMm2: 211.5 });
    expect(q).toEqual([
      { field: 'massG', message: 'massG is about ten times the nominal mass: a decimal point?' },
    ]);
  });

  it('questions areas above 1.6 × nominal only (issue 13 bound), never undersized ones', () => {
    expect(
      questionReading({ method: 'mass', nominalAreaMm2: 21.15, areaMm2: 21.15 * 1.59 }),
    ).toEqual([]);
    expect(
      questionReading({ method: 'mass', nominalAreaMm2: 21.15, areaMm2: 21.15 * 0.4 }),
    ).toEqual([]);
    expect(
      questionReading({ method: 'resistance', nominalAreaMm2: 25, areaMm2: 25 * 0.001 }),
    ).toEqual([]);
    const r = questionReading({ method: 'resistance', nominalAreaMm2: 25, areaMm2: 25 * 1000 });
    expect(r[0].field).toBe('resistanceOhm');
    expect(r[0].message).toMatch(/thousand times/);
  });

  it('a strand count more than 10 % off the claim is questioned (issue 13)', () => {
    const base = {
      method: 'strands' as const,
      nominalAreaMm2: 21.15,
      areaMm2: 21,
      claimedStrands: 420,
    };
    expect(questionReading({ ...base, countedStrands: 462 })).toEqual([]); // exactly 10 %
    expect(questionReading({ ...base, countedStrands: 370 })[0].field).toBe('count'); // 11.9 % off
  });

  it('a mass–resistivity product that fits no metal is questioned on the reading being entered', () => {
    const q = questionReading({
      method: 'resistance',
      nominalAreaMm2: 21.15,
      areaMm2: 20,
      identification: 'inconsistent',
    });
    expect(q[0].field).toBe('resistanceOhm');
    expect(q[0].message).toMatch(/fits no conductor metal/);
  });
});
