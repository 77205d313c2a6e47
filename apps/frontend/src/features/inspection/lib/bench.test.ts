import { describe, expect, it } from 'vitest';
import {
  benchTargets,
  nextTarget,
  preferredMethod,
  targetKey,
} from '@/features/inspection/lib/bench';
import {
  checkRemembered,
  readBenchMemory,
  writeBenchMemory,
} from '@/features/inspection/lib/bench-memory';
import type {
  Conductor,
  Instrument,
  LotDetail,
  Reading,
  Sample,
} from '@/features/inspection/types';

const conductor = (
  id: number,
  position: number,
  claimedStrands: number | null = 259,
): Conductor => ({
  id,
  position,
  purpose: position === 1 ? 'power' : 'ground',
  gauge: '4 AWG',
  gaugeSystem: 'awg',
  nominalAreaMm2: 21.15,
  claimedMaterial: 'copper',
  claimedStrands,
  conductorClass: null,
  active: true,
});

const reading = (voided: boolean) => ({ voided }) as Reading;
const sample = (seq: number, conductorId: number, readings: Reading[]): Sample =>
  ({ id: seq * 100 + conductorId, seq, conductorId, readings, verdict: 'untested' }) as Sample;

const kitLot = (samples: Sample[]): LotDetail =>
  ({
    samplingPlan: { sampleSize: 2 },
    product: { conductors: [conductor(2, 2), conductor(1, 1)] },
    samples,
  }) as unknown as LotDetail;

describe('bench targets', () => {
  it('lists unit by unit, every conductor of a kit in its order, and units cut beyond the plan', () => {
    const lot = kitLot([sample(3, 1, [reading(false)])]);
    expect(benchTargets(lot).map(targetKey)).toEqual(['1:1', '1:2', '2:1', '2:2', '3:1']);
  });

  it('goes to the first piece without a live reading, skipping those just recorded here', () => {
    const lot = kitLot([sample(1, 1, [reading(false)]), sample(1, 2, [reading(true)])]);
    const targets = benchTargets(lot);
    expect(targetKey(nextTarget(targets)!)).toBe('1:2');
    expect(targetKey(nextTarget(targets, undefined, new Set(['1:2']))!)).toBe('2:1');
    expect(targetKey(nextTarget(targets, '2:2')!)).toBe('1:2');
  });

  it('prefers mass for stranded conductors and the diameter for a solid one', () => {
    expect(preferredMethod(conductor(1, 1))).toBe('mass');
    expect(preferredMethod(conductor(1, 1, 1))).toBe('diameter');
  });
});

describe('bench memory', () => {
  const balance = (over: Partial<Instrument>): Instrument =>
    ({
      id: 7,
      kind: 'balance',
      name: 'Bench balance',
      serial: 'B-1',
      active: true,
      calibrationStatus: 'ok',
      calibrationDueOn: '2027-01-01',
      ...over,
    }) as Instrument;

  it('keeps an instrument in calibration and refuses an overdue one with the reason', () => {
    expect(checkRemembered({ massResolutionG: '7' }, [balance({})])).toEqual({
      usable: { massResolutionG: '7' },
      refused: [],
    });
    const overdue = checkRemembered({ massResolutionG: '7' }, [
      balance({ calibrationStatus: 'overdue', calibrationDueOn: '2026-01-01' }),
    ]);
    expect(overdue.usable).toEqual({});
    expect(overdue.refused[0]).toMatch(/overdue for calibration since 2026-01-01/);
    expect(checkRemembered({ massResolutionG: '8' }, [balance({})]).refused[0]).toMatch(
      /no longer in the active register/,
    );
  });

  it('reads back what it wrote, and an unreadable entry as empty', () => {
    const memory = { instruments: { massResolutionG: '7' }, values: { 'mass:lengthMm': '1000' } };
    writeBenchMemory(memory, localStorage);
    expect(readBenchMemory(localStorage)).toEqual(memory);
    localStorage.setItem('gaugeproof.bench.v1', '{not json');
    expect(readBenchMemory(localStorage)).toEqual({ instruments: {}, values: {} });
  });
});
