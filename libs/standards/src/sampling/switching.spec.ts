import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { StandardsInputError } from '../errors.js';
import { lotOutcome, samplingPlan } from './plan.js';
import {
  approveReducedInspection,
  initialInspectionState,
  nextInspectionState,
  type InspectionState,
} from './switching.js';

const run = (state: InspectionState, accepted: boolean[]): InspectionState =>
  accepted.reduce((s, a) => nextInspectionState(s, { accepted: a }), state);

/** A normal-inspection lot of 800 at AQL 1.0 (J, Ac 2; Table II-A) with `count` nonconforming. */
const normalLot = (count: number, extra: object = {}) => {
  const plan = samplingPlan({ lotSize: 800 });
  return {
    accepted: lotOutcome(plan, count) !== 'reject',
    plan,
    nonconformingCount: count,
    ...extra,
  };
};

describe('switching rules (ANSI/ASQ Z1.4; ISO 2859-1; REFERENCE §6)', () => {
  it('starts on normal inspection, as plain JSON', () => {
    const s = initialInspectionState();
    expect(s.severity).toBe('normal');
    expect(JSON.parse(JSON.stringify(s))).toEqual(s);
  });

  it('tightens when 2 of 5 or fewer consecutive lots are not accepted', () => {
    expect(run(initialInspectionState(), [false, true, true, true, true, false]).severity).toBe(
      'normal',
    ); // 6 lots apart
    expect(run(initialInspectionState(), [true, false, true, true, true, false]).severity).toBe(
      'tightened',
    ); // within 5
    expect(run(initialInspectionState(), [true, false, true, true, false]).severity).toBe(
      'tightened',
    );
    const s = run(initialInspectionState(), [false, false]);
    expect(s.severity).toBe('tightened');
    expect(s.lastChange?.reason).toMatch(/2 of the last 2 lots/);
  });

  it('returns from tightened to normal after 5 consecutive accepted lots', () => {
    const tightened = run(initialInspectionState(), [false, false]);
    expect(run(tightened, [true, true, true, true]).severity).toBe('tightened');
    expect(run(tightened, [true, true, false, true, true, true, true]).severity).toBe('tightened');
    expect(run(tightened, [true, true, true, true, true]).severity).toBe('normal');
  });

  it('discontinues after 5 lots not accepted while on tightened', () => {
    const tightened = run(initialInspectionState(), [false, false]);
    const s = run(tightened, [false, true, false, true, false, false]);
    expect(s.severity).toBe('tightened');
    const d = run(s, [false]);
    expect(d.severity).toBe('discontinued');
    expect(run(d, [true, true]).severity).toBe('discontinued');
    expect(
      nextInspectionState(d, { accepted: true, resumeAfterCorrectiveAction: true }).severity,
    ).toBe('tightened');
  });

  it('moves to reduced only at score 30 with production steady and explicit approval (ISO 2859-1, score rule from memory)', () => {
    let s = initialInspectionState();
    for (let i = 0; i < 9; i += 1)
      s = nextInspectionState(s, normalLot(0, { approveReduced: true }));
    expect(s.switchingScore).toBe(27); // Ac 2: +3 per lot also accepted at AQL 0.65
    expect(s.severity).toBe('normal');
    const eligible = nextInspectionState(s, normalLot(1));
    expect(eligible).toMatchObject({
      severity: 'normal',
      switchingScore: 30,
      reducedEligible: true,
    });
    expect(nextInspectionState(s, normalLot(1, { approveReduced: true })).severity).toBe('reduced');
    expect(
      nextInspectionState(s, normalLot(1, { approveReduced: true, productionSteady: false }))
        .severity,
    ).toBe('normal');
    expect(approveReducedInspection(eligible).severity).toBe('reduced');
    expect(() => approveReducedInspection(s)).toThrow(StandardsInputError);
  });

  it('resets the score on a lot not passing at the tighter AQL, or with Ac 0–1 adds 2', () => {
    const s = nextInspectionState(
      nextInspectionState(initialInspectionState(), normalLot(0)),
      normalLot(2),
    );
    expect(s.switchingScore).toBe(0); // 2 > Ac 1 at AQL 0.65
    const small = samplingPlan({ lotSize: 100 }); // F at 1.0: n 13, Ac 0 (Table II-A arrow)
    expect(
      nextInspectionState(initialInspectionState(), {
        accepted: true,
        plan: small,
        nonconformingCount: 0,
      }).switchingScore,
    ).toBe(2);
  });

  it('returns from reduced to normal on a lot not accepted, the gap count, irregular production or decision', () => {
    let s = initialInspectionState();
    for (let i = 0; i < 10; i += 1)
      s = nextInspectionState(s, normalLot(0, { approveReduced: true }));
    expect(s.severity).toBe('reduced');
    const reducedPlan = samplingPlan({ lotSize: 800, severity: 'reduced' });
    expect(nextInspectionState(s, { accepted: false }).severity).toBe('normal');
    expect(
      nextInspectionState(s, { accepted: true, plan: reducedPlan, nonconformingCount: 2 }).severity,
    ).toBe('normal');
    expect(nextInspectionState(s, { accepted: true, productionSteady: false }).severity).toBe(
      'normal',
    );
    expect(nextInspectionState(s, { accepted: true, returnToNormal: true }).severity).toBe(
      'normal',
    );
    expect(
      nextInspectionState(s, { accepted: true, plan: reducedPlan, nonconformingCount: 1 }).severity,
    ).toBe('reduced');
  });

  it('never goes from reduced straight to tightened (property)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            count: fc.integer({ min: 0, max: 4 }),
            approve: fc.boolean(),
            steady: fc.boolean(),
          }),
          { maxLength: 80 },
        ),
        (lots) => {
          let s = initialInspectionState();
          for (const lot of lots) {
            const severity = s.severity === 'discontinued' ? 'tightened' : s.severity;
            const plan = samplingPlan({ lotSize: 800, severity });
            const accepted = lotOutcome(plan, lot.count) !== 'reject';
            const next = nextInspectionState(s, {
              accepted,
              plan,
              nonconformingCount: lot.count,
              approveReduced: lot.approve,
              productionSteady: lot.steady,
            });
            if (s.severity === 'reduced') expect(next.severity).not.toBe('tightened');
            if (next.severity === 'reduced' && s.severity !== 'reduced') {
              expect(s.severity).toBe('normal');
              expect(lot.approve).toBe(true);
            }
            expect(JSON.parse(JSON.stringify(next))).toEqual(next);
            s = next;
          }
        },
      ),
      { numRuns: 300 },
    );
  });

  it('refuses a lot result that contradicts its count, and broken state', () => {
    expect(() =>
      nextInspectionState(initialInspectionState(), { ...normalLot(3), accepted: true }),
    ).toThrow(StandardsInputError);
    expect(() =>
      nextInspectionState({ severity: 'lax' } as unknown as InspectionState, { accepted: true }),
    ).toThrow(StandardsInputError);
    expect(() =>
      nextInspectionState(initialInspectionState(), {} as { accepted: boolean }),
    ).toThrow(StandardsInputError);
  });
});
