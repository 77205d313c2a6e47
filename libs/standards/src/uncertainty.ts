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

/**
 * What an instrument's register entry says about it, beyond its resolution (GUM 4.3: every
 * known source enters the budget). All optional; a missing one contributes nothing.
 */
export interface InstrumentAccuracy {
  /** Stated accuracy as a percentage of the reading, ±p % (the maker's specification). */
  accuracyPercentOfReading?: number;
  /** Stated accuracy as a fixed amount in the instrument's unit, ±a (e.g. "± 2 digits"). */
  accuracyAbsolute?: number;
  /** Expanded uncertainty from the calibration certificate, k = 2, in the instrument's unit. */
  calibrationUncertainty?: number;
}

/** Standard uncertainty of a certificate's expanded uncertainty U at k = 2: U/2 (GUM 6.2; REFERENCE §5). */
export const calibrationStandardUncertainty = (expanded: number): number => expanded / 2;

/**
 * GUM Table G.2, t_p(ν) for p = 95.45 %: the coverage factor that gives the same coverage
 * as k = 2 for a normal distribution, by degrees of freedom ν. Beyond 100 it tends to 2.000.
 */
const T_95_45: readonly (readonly [dof: number, t: number])[] = [
  [1, 13.97], // GUM Table G.2
  [2, 4.53], // GUM Table G.2
  [3, 3.31], // GUM Table G.2
  [4, 2.87], // GUM Table G.2
  [5, 2.65], // GUM Table G.2
  [6, 2.52], // GUM Table G.2
  [7, 2.43], // GUM Table G.2
  [8, 2.37], // GUM Table G.2
  [9, 2.32], // GUM Table G.2
  [10, 2.28], // GUM Table G.2
  [11, 2.25], // GUM Table G.2
  [12, 2.23], // GUM Table G.2
  [13, 2.21], // GUM Table G.2
  [14, 2.2], // GUM Table G.2
  [15, 2.18], // GUM Table G.2
  [16, 2.17], // GUM Table G.2
  [17, 2.16], // GUM Table G.2
  [18, 2.15], // GUM Table G.2
  [19, 2.14], // GUM Table G.2
  [20, 2.13], // GUM Table G.2
  [25, 2.11], // GUM Table G.2
  [30, 2.09], // GUM Table G.2
  [35, 2.07], // GUM Table G.2
  [40, 2.06], // GUM Table G.2
  [45, 2.06], // GUM Table G.2
  [50, 2.05], // GUM Table G.2
  [100, 2.025], // GUM Table G.2
];

/**
 * Coverage factor k for effective degrees of freedom ν_eff (GUM G.4.1 and Table G.2, p =
 * 95.45 %): ν_eff is truncated to the next lower tabulated value (GUM G.4.1 note 1 asks to
 * truncate to the lower integer; between table rows the lower row is the safe side); k = 2
 * above 100 and for infinite ν (Type B only).
 */
export function coverageFactorFor(effectiveDof: number): number {
  if (!(effectiveDof >= 1)) return T_95_45[0][1];
  if (!Number.isFinite(effectiveDof) || effectiveDof > 100) return COVERAGE_FACTOR;
  let k = T_95_45[0][1];
  for (const [dof, t] of T_95_45) if (dof <= effectiveDof) k = t;
  return k;
}

/**
 * Welch–Satterthwaite (GUM G.4.1): ν_eff = u_c⁴ / Σ (cᵢuᵢ)⁴/νᵢ, here on relative
 * contributions. Type B components have ν = ∞ and drop out; Infinity when none is Type A.
 */
export function welchSatterthwaite(budget: readonly BudgetComponent[]): number {
  const uc = combinedRelative(budget);
  let denominator = 0;
  for (const c of budget) {
    const dof = c.degreesOfFreedom ?? Infinity;
    if (Number.isFinite(dof) && c.relativeContribution > 0) {
      denominator += c.relativeContribution ** 4 / dof;
    }
  }
  return denominator === 0 ? Infinity : uc ** 4 / denominator;
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
  /** Degrees of freedom νᵢ: n − 1 for a Type A spread (GUM 4.2); absent (∞) for Type B. */
  degreesOfFreedom?: number;
}

/** Cross-section result of a method. */
export interface AreaResult {
  areaMm2: number;
  /** Combined standard uncertainty u, mm². */
  uMm2: number;
  /** Expanded uncertainty U = k·u, mm²; k = 2, or from ν_eff when a Type A term has few readings. */
  UMm2: number;
  coverageFactor: number;
  /** ν_eff by Welch–Satterthwaite (GUM G.4.1); null when every component is Type B (∞). */
  effectiveDegreesOfFreedom: number | null;
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

/**
 * The budget lines an instrument contributes to the reading `value` it gave (GUM 4.3; REFERENCE
 * §5): resolution δ/√12 (GUM F.2.2.1), stated accuracy a/√3 with a = p % of the reading plus
 * the absolute part (GUM 4.3.7), calibration U/2 (the certificate's k = 2). `readings` is how
 * many readings of this instrument enter the value (a length read at both ends: 2; their
 * resolution terms add in quadrature, √2·δ/√12).
 */
export function instrumentComponents(
  quantity: string,
  value: number,
  unit: string,
  sensitivity: number,
  resolution: number,
  accuracy: InstrumentAccuracy | undefined,
  options: { readings?: number; resolutionNote?: string } = {},
): BudgetComponent[] {
  const readings = options.readings ?? 1;
  const lines: BudgetComponent[] = [];
  const both = readings === 2 ? ', read at both ends: √2·δ/√12' : '';
  lines.push(
    component(
      `${quantity}: resolution`,
      value,
      unit,
      resolutionUncertainty(resolution) * Math.sqrt(readings),
      sensitivity,
      `${options.resolutionNote ?? 'resolution'} δ = ${resolution} ${unit}, δ/√12 (GUM F.2.2.1)${both}`,
    ),
  );
  const pct = accuracy?.accuracyPercentOfReading ?? 0;
  const abs = accuracy?.accuracyAbsolute ?? 0;
  if (pct > 0 || abs > 0) {
    const a = (pct / 100) * Math.abs(value) + abs;
    const stated = [pct > 0 ? `${pct} % of reading` : '', abs > 0 ? `${abs} ${unit}` : '']
      .filter(Boolean)
      .join(' + ');
    lines.push(
      component(
        `${quantity}: stated accuracy`,
        value,
        unit,
        toleranceUncertainty(a),
        sensitivity,
        `±(${stated}) = ±${Number(a.toPrecision(3))} ${unit}, a/√3 (GUM 4.3.7)`,
      ),
    );
  }
  const cal = accuracy?.calibrationUncertainty ?? 0;
  if (cal > 0) {
    lines.push(
      component(
        `${quantity}: calibration`,
        value,
        unit,
        calibrationStandardUncertainty(cal),
        sensitivity,
        `certificate U = ${cal} ${unit} (k = 2), U/2 (GUM 6.2)`,
      ),
    );
  }
  return lines;
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
  const dof = welchSatterthwaite(budget);
  const k = coverageFactorFor(dof);
  return {
    areaMm2,
    uMm2,
    UMm2: k * uMm2,
    coverageFactor: k,
    effectiveDegreesOfFreedom: Number.isFinite(dof) ? dof : null,
    budget,
    note,
  };
}
