import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { StandardsInputError } from '../errors.js';
import {
  acceptedAtTighterAql,
  aqlKey,
  codeLetterFor,
  INSPECT_ALL_RULE,
  lotOutcome,
  MAX_AQL_NONCONFORMING_UNITS,
  requireAqlForNonconformingUnits,
  SAMPLING_PLAN_NAME,
  sampleProgress,
  samplingPlan,
} from './plan.js';
import {
  AQLS,
  CODE_LETTERS,
  INSPECTION_LEVELS,
  PLAN_TABLE,
  SAMPLING_TABLES_SOURCE,
  SEVERITIES,
} from './tables.js';

describe('samplingPlan (MIL-STD-105E Tables I, II-A/B/C; ANSI/ASQ Z1.4)', () => {
  it('lot 501–1200, level II → J, n = 80, AQL 1.0 Ac 2 Re 3 (REFERENCE §6 check value)', () => {
    for (const lotSize of [501, 800, 1200]) {
      expect(samplingPlan({ lotSize })).toEqual({
        lotSize,
        level: 'II',
        aql: '1.0',
        severity: 'normal',
        codeLetter: 'J',
        sampleSize: 80,
        planSampleSize: 80,
        accept: 2,
        reject: 3,
        inspectAll: false,
      });
    }
  });

  it('reads tightened and reduced plans (MIL-STD-105E Tables II-B, II-C)', () => {
    expect(samplingPlan({ lotSize: 800, severity: 'tightened' })).toMatchObject({
      sampleSize: 80,
      accept: 1,
      reject: 2,
    });
    expect(samplingPlan({ lotSize: 800, severity: 'reduced' })).toMatchObject({
      sampleSize: 32,
      accept: 1,
      reject: 3,
    });
  });

  it('follows the arrows: J at AQL 0.40 uses n = 125, Ac 1 (Table II-A)', () => {
    expect(samplingPlan({ lotSize: 800, aql: 0.4 })).toMatchObject({
      codeLetter: 'J',
      sampleSize: 125,
      accept: 1,
      reject: 2,
    });
  });

  it('caps the sample at the lot and flags 100 % inspection (the JSON notes)', () => {
    // lot 2–8 level II → A; AQL 1.0 → n = 13 (Table II-A arrow) > lot of 5
    expect(samplingPlan({ lotSize: 5 })).toMatchObject({
      codeLetter: 'A',
      sampleSize: 5,
      planSampleSize: 13,
      inspectAll: true,
      accept: 0,
      reject: 1,
    });
    expect(samplingPlan({ lotSize: 5, aql: '6.5' })).toMatchObject({
      sampleSize: 2,
      inspectAll: false,
    });
  });

  it('a lot of one: one sample, every unit inspected, one nonconforming unit rejects it', () => {
    // Table I starts at 2: a lot of 1 takes the 2–8 row (level II → A, AQL 1.0 → n 13, Ac 0 Re 1)
    const single = samplingPlan({ lotSize: 1 });
    expect(single).toMatchObject({
      lotSize: 1,
      codeLetter: 'A',
      sampleSize: 1,
      planSampleSize: 13,
      inspectAll: true,
      accept: 0,
      reject: 1,
    });
    expect(lotOutcome(single, 0)).toBe('accept');
    expect(lotOutcome(single, 1)).toBe('reject');
    expect(sampleProgress(single, 0, 0)).toBe('in_progress');
    expect(sampleProgress(single, 1, 0)).toBe('accept');
    expect(INSPECT_ALL_RULE).toMatch(
      /ANSI\/ASQ Z1\.4 \/ ISO 2859-1: when the sample size equals or exceeds the lot size, inspect every unit/,
    );
    // Level III, AQL 10 → B, n 5, Ac 1 Re 2 in the table (Table II-A arrow): a reject number of
    // 2 could never be reached with one unit, so the unit alone decides (Ac 0, Re 1).
    expect(samplingPlan({ lotSize: 2, level: 'III', aql: '10' })).toMatchObject({
      sampleSize: 2,
      accept: 1,
      reject: 2,
    });
    expect(samplingPlan({ lotSize: 1, level: 'III', aql: '10' })).toMatchObject({
      codeLetter: 'B',
      sampleSize: 1,
      inspectAll: true,
      accept: 0,
      reject: 1,
    });
    // Reduced 2/0/2 cell: one unit can only reach 1.
    expect(samplingPlan({ lotSize: 1, severity: 'reduced', aql: '10' })).toMatchObject({
      sampleSize: 1,
      accept: 0,
      reject: 1,
    });
    expect(codeLetterFor(1, 'III')).toBe('B');
  });

  it('every lot of one, at any level, AQL up to 10 and severity, is one unit inspected: Ac 0, Re 1', () => {
    for (const level of INSPECTION_LEVELS) {
      for (const aql of AQLS.filter((a) => Number(a) <= MAX_AQL_NONCONFORMING_UNITS)) {
        for (const severity of SEVERITIES) {
          expect(samplingPlan({ lotSize: 1, level, aql, severity })).toMatchObject({
            sampleSize: 1,
            inspectAll: true,
            accept: 0,
            reject: 1,
          });
        }
      }
    }
  });

  it('from a lot of 2 up, plans counting units are the table cells unchanged (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2, max: 1_000_000 }),
        fc.constantFrom(...INSPECTION_LEVELS),
        fc.constantFrom(...AQLS.filter((a) => Number(a) <= MAX_AQL_NONCONFORMING_UNITS)),
        fc.constantFrom(...SEVERITIES),
        (lotSize, level, aql, severity) => {
          const p = samplingPlan({ lotSize, level, aql, severity });
          const [n, ac, re] = PLAN_TABLE[severity][p.codeLetter][AQLS.indexOf(aql)];
          expect([p.planSampleSize, p.accept, p.reject]).toEqual([n, ac, re]);
        },
      ),
      { numRuns: 2000 },
    );
  });

  it('gives Table I letters for the special levels and the range ends', () => {
    expect(codeLetterFor(2, 'S-1')).toBe('A'); // Table I, 2–8
    expect(codeLetterFor(8, 'III')).toBe('B'); // Table I, 2–8
    expect(codeLetterFor(9, 'III')).toBe('C'); // Table I, 9–15
    expect(codeLetterFor(1201, 'S-4')).toBe('G'); // Table I, 1201–3200
    expect(codeLetterFor(10_000_000, 'II')).toBe('Q'); // Table I, 500 001 and over
    expect(codeLetterFor(10_000_000, 'III')).toBe('R');
  });

  it('reject > accept in every table cell (exhaustive over the tables)', () => {
    let cells = 0;
    for (const severity of SEVERITIES) {
      for (const letter of CODE_LETTERS) {
        expect(PLAN_TABLE[severity][letter]).toHaveLength(AQLS.length);
        for (const [n, ac, re] of PLAN_TABLE[severity][letter]) {
          expect(re).toBeGreaterThan(ac);
          expect(n).toBeGreaterThan(0);
          if (severity !== 'reduced') expect(re).toBe(ac + 1);
          cells += 1;
        }
      }
    }
    expect(cells).toBe(3 * 16 * 26);
  });

  it('every plan has reject > accept and a sample no larger than the lot (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1_000_000 }),
        fc.constantFrom(...INSPECTION_LEVELS),
        fc.constantFrom(...AQLS),
        fc.constantFrom(...SEVERITIES),
        (lotSize, level, aql, severity) => {
          const p = samplingPlan({ lotSize, level, aql, severity });
          expect(p.reject).toBeGreaterThan(p.accept);
          expect(p.sampleSize).toBeLessThanOrEqual(lotSize);
          expect(p.inspectAll).toBe(p.planSampleSize >= lotSize);
        },
      ),
    );
  });

  it('keeps the source of the tables', () => {
    expect(SAMPLING_TABLES_SOURCE).toMatch(/^MIL-STD-105E/);
  });

  it('accepts AQLs written as numbers or strings, refuses others', () => {
    expect(aqlKey(1)).toBe('1.0');
    expect(aqlKey('0.65')).toBe('0.65');
    expect(aqlKey(0.065)).toBe('0.065');
    expect(() => aqlKey('0.3')).toThrow(StandardsInputError);
    expect(() => samplingPlan({ lotSize: 800, aql: 2 })).toThrow(/AQL 2 is not in the tables/);
  });
});

describe('lotOutcome', () => {
  it('accepts at Ac, rejects at Re (MIL-STD-105E)', () => {
    const plan = samplingPlan({ lotSize: 800 }); // J, 80, Ac 2, Re 3
    expect(lotOutcome(plan, 0)).toBe('accept');
    expect(lotOutcome(plan, 2)).toBe('accept');
    expect(lotOutcome(plan, 3)).toBe('reject');
    expect(lotOutcome(plan, 80)).toBe('reject');
  });

  it('on reduced, a count between Ac and Re accepts and returns to normal (the JSON notes)', () => {
    const plan = samplingPlan({ lotSize: 800, severity: 'reduced' }); // J reduced 1.0: 32, Ac 1, Re 3
    expect(lotOutcome(plan, 1)).toBe('accept');
    expect(lotOutcome(plan, 2)).toBe('accept_and_return_to_normal');
    expect(lotOutcome(plan, 3)).toBe('reject');
  });

  it('refuses impossible counts', () => {
    const plan = samplingPlan({ lotSize: 800 });
    expect(() => lotOutcome(plan, -1)).toThrow(StandardsInputError);
    expect(() => lotOutcome(plan, 1.5)).toThrow(StandardsInputError);
    expect(() => lotOutcome(plan, 81)).toThrow(/sample of 80/);
  });

  it('knows when a lot also passes at the AQL one step tighter (Table II-A)', () => {
    const plan = samplingPlan({ lotSize: 800 }); // AQL 1.0; one step tighter 0.65: J → 80, Ac 1
    expect(acceptedAtTighterAql(plan, 1)).toBe(true);
    expect(acceptedAtTighterAql(plan, 2)).toBe(false);
    expect(acceptedAtTighterAql(samplingPlan({ lotSize: 800, aql: '0.010' }), 0)).toBe(false);
  });
});

describe('curtailed rejection and AQL limits (issue 13 points 5 and 8)', () => {
  // lot 501–1200, level II → J, n = 80, AQL 1.0: Ac 2, Re 3 (REFERENCE §6, MIL-STD-105E)
  const plan = samplingPlan({ lotSize: 1000, aql: '1.0' });

  it('rejects as soon as the count reaches Re, accepts only after every planned unit', () => {
    expect(sampleProgress(plan, 21, 3)).toBe('reject');
    expect(sampleProgress(plan, 3, 3)).toBe('reject');
    expect(sampleProgress(plan, 79, 0)).toBe('in_progress');
    expect(sampleProgress(plan, 79, 2)).toBe('in_progress');
    expect(sampleProgress(plan, 80, 2)).toBe('accept');
    expect(() => sampleProgress(plan, 2, 3)).toThrow(/cannot come from 2 inspected/);
  });

  it('refuses AQLs above 10 for plans counting nonconforming units (Z1.4; ISO 2859-1)', () => {
    expect(requireAqlForNonconformingUnits('10')).toBe('10');
    expect(requireAqlForNonconformingUnits(6.5)).toBe('6.5');
    expect(() => requireAqlForNonconformingUnits('65')).toThrow(/nonconformities per 100 units/);
    expect(() => requireAqlForNonconformingUnits(1000)).toThrow(/AQL 10 or below/);
    expect(MAX_AQL_NONCONFORMING_UNITS).toBe(10);
    expect(SAMPLING_PLAN_NAME).toMatch(
      /ANSI\/ASQ Z1\.4 \/ MIL-STD-105E single sampling; switching per ISO 2859-1/,
    );
  });
});
