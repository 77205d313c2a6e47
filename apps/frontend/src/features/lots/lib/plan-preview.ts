import {
  samplingPlan,
  StandardsInputError,
  type Aql,
  type InspectionLevel,
} from '@gaugeproof/standards';
import type { InspectionSeverity, SamplingPlan } from '@/features/lots/types';
import { singular } from '@/lib/counts';

export interface PlanPreviewInput {
  quantity: number | null;
  inspectionLevel: string;
  aql: string;
  /** The product's current switching state; discontinued means no plan at all. */
  severity: InspectionSeverity;
}

export type PlanPreview =
  | { kind: 'none' }
  | { kind: 'discontinued' }
  | { kind: 'plan'; plan: SamplingPlan }
  | { kind: 'error'; message: string };

/**
 * The plan computed in the browser with the same library the server uses, for instant
 * feedback while typing; the server's plan (from the product's stored state) is authoritative.
 */
export function previewPlan(input: PlanPreviewInput): PlanPreview {
  if (input.quantity === null) return { kind: 'none' };
  if (input.severity === 'discontinued') return { kind: 'discontinued' };
  try {
    const plan = samplingPlan({
      lotSize: input.quantity,
      level: input.inspectionLevel as InspectionLevel,
      aql: input.aql as Aql,
      severity: input.severity,
    });
    return {
      kind: 'plan',
      plan: {
        severity: plan.severity,
        level: plan.level,
        aql: plan.aql,
        codeLetter: plan.codeLetter,
        sampleSize: plan.sampleSize,
        accept: plan.accept,
        reject: plan.reject,
        inspectAll: plan.inspectAll,
      },
    };
  } catch (error) {
    if (error instanceof StandardsInputError) return { kind: 'error', message: error.message };
    throw error;
  }
}

/** What to cut: "Cut 5 spools, one sample from each", or every unit when n reaches the lot size. */
export function cutInstruction(plan: SamplingPlan, unit: string): string {
  const noun = unit.trim() || 'units';
  if (plan.inspectAll && plan.sampleSize === 1) {
    return `Inspect the one unit (${singular(noun)}): the lot is a single unit (100 % inspection)`;
  }
  if (plan.inspectAll) {
    return `Inspect all ${plan.sampleSize} ${noun}: the sample reaches the lot size (100 % inspection)`;
  }
  return `Cut ${plan.sampleSize} ${noun}, one sample from each`;
}
