import { describe, expect, it } from 'vitest';
import { parseLotQuantity } from '@/features/lots/api/create-lot';
import { cutInstruction, previewPlan } from '@/features/lots/lib/plan-preview';
import { countOf } from '@/lib/counts';

const policy = { inspectionLevel: 'S-3', aql: '1.0', severity: 'normal' as const };

describe('previewPlan', () => {
  it('50 spools at S-3, AQL 1.0: code letter B, the arrow leads to n = 13, Ac 0, Re 1', () => {
    // MIL-STD-105E Table I (26–50 at S-3 → B) and Table II-A (AQL 1.0 arrows down to 13, 0/1).
    const preview = previewPlan({ ...policy, quantity: 50 });
    expect(preview).toEqual({
      kind: 'plan',
      plan: {
        severity: 'normal',
        level: 'S-3',
        aql: '1.0',
        codeLetter: 'B',
        sampleSize: 13,
        accept: 0,
        reject: 1,
        inspectAll: false,
      },
    });
    if (preview.kind === 'plan') {
      expect(cutInstruction(preview.plan, 'spools')).toBe('Cut 13 spools, one sample from each');
    }
  });

  it('inspects every unit when the plan’s sample reaches the lot size', () => {
    const preview = previewPlan({ ...policy, quantity: 10 });
    expect(preview.kind).toBe('plan');
    if (preview.kind !== 'plan') return;
    expect(preview.plan).toMatchObject({ sampleSize: 10, inspectAll: true });
    expect(cutInstruction(preview.plan, 'kits')).toBe(
      'Inspect all 10 kits: the sample reaches the lot size (100 % inspection)',
    );
  });

  it('plans a lot of one as that one unit, inspected whole', () => {
    const preview = previewPlan({ ...policy, quantity: 1 });
    expect(preview.kind).toBe('plan');
    if (preview.kind !== 'plan') return;
    expect(preview.plan).toMatchObject({ sampleSize: 1, inspectAll: true, accept: 0, reject: 1 });
    expect(cutInstruction(preview.plan, 'reels')).toBe(
      'Inspect the one unit (reel): the lot is a single unit (100 % inspection)',
    );
  });

  it('uses the tightened table when the product is on tightened inspection', () => {
    const normal = previewPlan({ ...policy, quantity: 500, inspectionLevel: 'II' });
    const tightened = previewPlan({
      ...policy,
      quantity: 500,
      inspectionLevel: 'II',
      severity: 'tightened',
    });
    expect(normal.kind === 'plan' && tightened.kind === 'plan').toBe(true);
    if (normal.kind !== 'plan' || tightened.kind !== 'plan') return;
    // Lot 281–500 at level II is letter H (Table I): normal n = 50, Ac 1, Re 2 at AQL 1.0 (II-A).
    expect(normal.plan).toMatchObject({ codeLetter: 'H', sampleSize: 50, accept: 1, reject: 2 });
    expect(tightened.plan.severity).toBe('tightened');
    expect(tightened.plan.accept).toBeLessThanOrEqual(normal.plan.accept);
  });

  it('shows no plan while the quantity is missing, and none when inspection is discontinued', () => {
    expect(previewPlan({ ...policy, quantity: null })).toEqual({ kind: 'none' });
    expect(previewPlan({ ...policy, quantity: 40, severity: 'discontinued' })).toEqual({
      kind: 'discontinued',
    });
  });

  it('reports an AQL the tables do not hold instead of crashing', () => {
    const preview = previewPlan({ ...policy, aql: '3.3', quantity: 40 });
    expect(preview.kind).toBe('error');
  });
});

describe('countOf', () => {
  it('names one unit in the singular, the rest as packing slips write them', () => {
    expect(countOf(1, 'reels')).toBe('1 reel');
    expect(countOf(1, 'boxes')).toBe('1 box');
    expect(countOf(1, 'feet')).toBe('1 foot');
    expect(countOf(40, 'spools')).toBe('40 spools');
    expect(countOf(1, '')).toBe('1 unit');
  });
});

describe('parseLotQuantity', () => {
  it('takes whole numbers of at least 1 only (a lot of one is a single drum)', () => {
    expect(parseLotQuantity('40')).toBe(40);
    expect(parseLotQuantity(' 2 ')).toBe(2);
    expect(parseLotQuantity('1')).toBe(1);
    expect(parseLotQuantity('0')).toBeNull();
    expect(parseLotQuantity('2.5')).toBeNull();
    expect(parseLotQuantity('-4')).toBeNull();
    expect(parseLotQuantity('')).toBeNull();
    expect(parseLotQuantity('12 spools')).toBeNull();
  });
});
