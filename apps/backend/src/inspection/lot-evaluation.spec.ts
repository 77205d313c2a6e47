import { describe, expect, it } from 'vitest';
import type { StoredSamplingPlan } from '../products/sampling-plan';
import { evaluateUnits, sampleVerdict, type UnitSample } from './lot-evaluation';

// Code letter C, AQL 6.5, normal: n = 5, Ac 1, Re 2 (MIL-STD-105E Table II-A).
const plan: StoredSamplingPlan = {
  severity: 'normal',
  level: 'S-3',
  aql: '6.5',
  codeLetter: 'C',
  sampleSize: 5,
  accept: 1,
  reject: 2,
  inspectAll: false,
};
const kit = [11, 12];
const unit = (seq: number, power: UnitSample['verdict'], ground: UnitSample['verdict']) => [
  { seq, conductorId: 11, verdict: power },
  { seq, conductorId: 12, verdict: ground },
];

describe('sampleVerdict', () => {
  it('ignores voided readings and ranks nonconforming over inconclusive over conforms', () => {
    expect(sampleVerdict([])).toBe('untested');
    expect(sampleVerdict([{ voided: true, verdict: 'nonconforming' }])).toBe('untested');
    expect(
      sampleVerdict([
        { voided: false, verdict: 'conforms' },
        { voided: false, verdict: 'inconclusive' },
      ]),
    ).toBe('inconclusive');
    expect(
      sampleVerdict([
        { voided: false, verdict: 'inconclusive' },
        { voided: false, verdict: 'nonconforming' },
      ]),
    ).toBe('nonconforming');
  });
});

describe('evaluateUnits', () => {
  it('accepts when every planned unit is tested and the count is at most Ac', () => {
    const samples = [1, 2, 3, 4, 5].flatMap((s) =>
      unit(s, s === 3 ? 'nonconforming' : 'conforms', 'conforms'),
    );
    const e = evaluateUnits(plan, 50, kit, samples);
    expect(e).toMatchObject({ samplesPlanned: 5, samplesTested: 5, nonconforming: 1 });
    expect(e.recommendation).toBe('accept');
  });

  it('rejects as soon as the reject number is reached, before all units are in', () => {
    const samples = [
      ...unit(1, 'nonconforming', 'untested'),
      ...unit(2, 'conforms', 'nonconforming'),
    ];
    const e = evaluateUnits(plan, 50, kit, samples);
    expect(e).toMatchObject({ samplesTested: 2, nonconforming: 2, recommendation: 'reject' });
  });

  it('is incomplete while a planned unit lacks a conductor', () => {
    const samples = [1, 2, 3, 4].flatMap((s) => unit(s, 'conforms', 'conforms'));
    samples.push({ seq: 5, conductorId: 11, verdict: 'conforms' });
    const e = evaluateUnits(plan, 50, kit, samples);
    expect(e).toMatchObject({ samplesTested: 4, nonconforming: 0, recommendation: 'incomplete' });
  });

  it('is incomplete when inconclusive units could still reach the reject number', () => {
    const samples = [1, 2, 3, 4, 5].flatMap((s) =>
      unit(s, s === 1 ? 'nonconforming' : s === 2 ? 'inconclusive' : 'conforms', 'conforms'),
    );
    const e = evaluateUnits(plan, 50, kit, samples);
    expect(e).toMatchObject({ nonconforming: 1, inconclusive: 1, recommendation: 'incomplete' });
  });

  it('accepts with an inconclusive unit that cannot change the outcome', () => {
    const samples = [1, 2, 3, 4, 5].flatMap((s) =>
      unit(s, s === 2 ? 'inconclusive' : 'conforms', 'conforms'),
    );
    const e = evaluateUnits(plan, 50, kit, samples);
    expect(e).toMatchObject({ nonconforming: 0, inconclusive: 1, recommendation: 'accept' });
  });
});
