import {
  INSPECT_ALL_RULE,
  SAMPLING_PLAN_NAME,
  samplingPlan,
  type Aql,
  type CodeLetter,
  type InspectionLevel,
  type SamplingPlan,
} from '@gaugeproof/standards';
import type { InspectionState } from './entities/inspection-state.entity';
import type { Product } from './entities/product.entity';
import { inspectionStateView } from './product-view';

/**
 * The plan a lot was received under, stored with the lot (`Lot.samplingPlan`) so later
 * changes of the product's level, AQL or severity never rewrite history.
 */
export interface StoredSamplingPlan {
  severity: 'normal' | 'tightened' | 'reduced';
  level: string;
  aql: string;
  codeLetter: string;
  sampleSize: number;
  accept: number;
  reject: number;
  inspectAll: boolean;
}

/** A stored plan as the standards library's plan type (for `lotOutcome` and switching). */
export function standardsPlan(plan: StoredSamplingPlan, lotSize: number): SamplingPlan {
  return {
    ...plan,
    lotSize,
    level: plan.level as InspectionLevel,
    aql: plan.aql as Aql,
    codeLetter: plan.codeLetter as CodeLetter,
    planSampleSize: plan.sampleSize,
  };
}

export interface PlanAnswer {
  samplingPlan: StoredSamplingPlan | null;
  severity: 'normal' | 'tightened' | 'reduced' | 'discontinued';
  discontinued: boolean;
  message: string;
}

const SEVERITY_WORDS = {
  normal: 'Normal inspection',
  tightened: 'Tightened inspection (recent lots of this product were not accepted)',
  reduced: "Reduced inspection (earned by this supplier's record)",
} as const;

/** Why a discontinued product cannot be received (ISO 2859-1 discontinuation of inspection). */
export function discontinuedMessage(product: Product, reason: string | null): string {
  const why = reason ?? 'too many lots were not accepted on tightened inspection.';
  return (
    `Inspection of ${product.supplier.name} ${product.sku} is discontinued (ISO 2859-1): ${why} ` +
    'No lot of it can be received until the QA lead restores inspection, once the supplier’s ' +
    'corrective action is accepted (inspection then resumes on tightened).'
  );
}

/** The plan as a lot keeps it (lots.sampling_plan), from the standards library's plan. */
export function storedPlanOf(plan: SamplingPlan): StoredSamplingPlan {
  return {
    severity: plan.severity,
    level: plan.level,
    aql: plan.aql,
    codeLetter: plan.codeLetter,
    sampleSize: plan.sampleSize,
    accept: plan.accept,
    reject: plan.reject,
    inspectAll: plan.inspectAll,
  };
}

const acceptWords = (ac: number) =>
  ac === 0 ? 'accept only with no nonconforming unit' : `accept with up to ${ac} nonconforming`;

/**
 * The sampling plan a lot of `quantity` units gets today: the product's level and AQL at
 * the stream's current severity (MIL-STD-105E / ANSI/ASQ Z1.4 through the standards library).
 */
export function planForLot(
  product: Product,
  state: InspectionState | null,
  quantity: number,
): PlanAnswer {
  const { severity, reason } = inspectionStateView(state);
  if (severity === 'discontinued') {
    return {
      samplingPlan: null,
      severity,
      discontinued: true,
      message: discontinuedMessage(product, reason),
    };
  }
  const plan = samplingPlan({
    lotSize: quantity,
    level: product.inspectionLevel as InspectionLevel,
    aql: product.aql as Aql,
    severity,
  });
  const stored = storedPlanOf(plan);
  const cut = !plan.inspectAll
    ? `cut ${plan.sampleSize} of the ${quantity} units`
    : quantity === 1
      ? 'inspect the one unit of the lot'
      : `inspect every one of the ${quantity} units`;
  const rule = plan.inspectAll ? ` ${INSPECT_ALL_RULE}` : '';
  const message =
    `${SEVERITY_WORDS[plan.severity]}: ${cut} (code letter ${plan.codeLetter}, level ${plan.level}, AQL ${plan.aql}); ` +
    `${acceptWords(plan.accept)}, reject at ${plan.reject}. ${SAMPLING_PLAN_NAME}.${rule}`;
  return { samplingPlan: stored, severity, discontinued: false, message };
}
