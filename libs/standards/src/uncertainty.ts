/**
 * Uncertainty arithmetic of the GUM (JCGM 100:2008), for measurement models that are a
 * product of powers, Y = c · Π Xᵢ^pᵢ: (u(y)/y)² = Σ (pᵢ · u(xᵢ)/xᵢ)² (GUM §5.1.6).
 */

/** Coverage factor for the expanded uncertainty U = k·u (REFERENCE §5; GUM §6.2). */
export const COVERAGE_FACTOR = 2;

/** Standard uncertainty of a digital reading of resolution δ: δ/√12 (GUM F.2.2.1). */
export const resolutionUncertainty = (resolution: number): number => resolution / Math.sqrt(12);

/** Standard uncertainty of a stated tolerance ±a with no other knowledge: a/√3 (GUM 4.3.7). */
export const toleranceUncertainty = (halfWidth: number): number => halfWidth / Math.sqrt(3);

/** Standard uncertainty of the mean of repeated readings: s/√n (GUM 4.2.3), 0 for one reading. */
export function meanUncertainty(values: readonly number[]): number {
  const n = values.length;
  if (n < 2) return 0;
  const mean = values.reduce((s, v) => s + v, 0) / n;
  const variance = values.reduce((s, v) => s + (v - mean) ** 2, 0) / (n - 1);
  return Math.sqrt(variance / n);
}

/** One line of an uncertainty budget. */
export interface BudgetComponent {
  /** What the component is, in the trade's words: "mass reading", "cut length". */
  name: string;
  /** The input's value as used. */
  value: number;
  unit: string;
  /** Standard uncertainty u(xᵢ) in `unit` (0 for a constant treated as exact). */
  standardUncertainty: number;
  /** Exponent pᵢ of the input in the product model: the relative sensitivity. */
  sensitivity: number;
  /** |pᵢ| · u(xᵢ)/xᵢ: this component's share of the relative standard uncertainty. */
  relativeContribution: number;
  /** How u(xᵢ) was obtained, or why it is zero. */
  note: string;
}

/** Cross-section result of a method. */
export interface AreaResult {
  areaMm2: number;
  /** Combined standard uncertainty u, mm². */
  uMm2: number;
  /** Expanded uncertainty U = k·u with k = 2, mm². */
  UMm2: number;
  coverageFactor: number;
  budget: BudgetComponent[];
  /** Says which conventional constants were treated as exact. */
  note: string;
}

/** A budget line for a measured input of a product model. */
export function component(
  name: string,
  value: number,
  unit: string,
  standardUncertainty: number,
  sensitivity: number,
  note: string,
): BudgetComponent {
  const relativeContribution = Math.abs((sensitivity * standardUncertainty) / value);
  return { name, value, unit, standardUncertainty, sensitivity, relativeContribution, note };
}

/** A budget line for a conventional constant, treated as exact. */
export function exactConstant(
  name: string,
  value: number,
  unit: string,
  sensitivity: number,
  source: string,
): BudgetComponent {
  const note = `conventional value (${source}), treated as exact`;
  return component(name, value, unit, 0, sensitivity, note);
}

/** Relative combined standard uncertainty: root sum of squares (GUM §5.1.6). */
export function combinedRelative(budget: readonly BudgetComponent[]): number {
  return Math.sqrt(budget.reduce((s, c) => s + c.relativeContribution ** 2, 0));
}

/** Assembles an area result from the area, its budget and the note on exact constants. */
export function areaResult(areaMm2: number, budget: BudgetComponent[], note: string): AreaResult {
  const uMm2 = areaMm2 * combinedRelative(budget);
  return {
    areaMm2,
    uMm2,
    UMm2: COVERAGE_FACTOR * uMm2,
    coverageFactor: COVERAGE_FACTOR,
    budget,
    note,
  };
}
