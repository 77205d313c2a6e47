import type { InspectionState as SwitchingState } from '@gaugeproof/standards';
import { supplierRef } from '../suppliers/supplier-view';
import type { ConductorSpec } from './entities/conductor-spec.entity';
import type { InspectionState } from './entities/inspection-state.entity';
import type { Product } from './entities/product.entity';

export function conductorView(c: ConductorSpec) {
  return {
    id: c.id,
    position: c.position,
    purpose: c.purpose,
    gauge: c.gaugeLabel,
    gaugeSystem: c.gaugeSystem,
    nominalAreaMm2: c.nominalAreaMm2,
    claimedMaterial: c.claimedMaterial,
    claimedStrands: c.claimedStrands,
    conductorClass: c.conductorClass ?? null,
    active: c.active,
  };
}
export type ConductorView = ReturnType<typeof conductorView>;

type WarnableConductor = Pick<ConductorSpec, 'purpose' | 'gaugeLabel' | 'nominalAreaMm2'>;

/**
 * Warnings about a product's conductors: power and ground run in one loop and carry the
 * same current, so a ground smaller (or larger) than its power is a kit to question
 * (common practice, no source).
 */
export function productWarnings(conductors: readonly WarnableConductor[]): string[] {
  const power = conductors.find((c) => c.purpose === 'power');
  if (!power) return [];
  return conductors
    .filter((c) => c.purpose === 'ground' && c.nominalAreaMm2 !== power.nominalAreaMm2)
    .map(
      (g) =>
        `Power is ${power.gaugeLabel} but ground is ${g.gaugeLabel}: ground should be sized like power (common practice).`,
    );
}

export function inspectionStateView(state: InspectionState | null) {
  const s = state?.state as Partial<SwitchingState> | undefined;
  return {
    severity: (state?.severity ?? 'normal') as SwitchingState['severity'],
    reason: state?.reason ?? s?.lastChange?.reason ?? null,
    reducedEligible: s?.reducedEligible === true,
  };
}

/**
 * Product as docs/api-conventions.md shows it. Conductors are the active ones unless
 * `allConductors` (a lot's detail may show specs its samples point at that were replaced).
 * The conductors collection must be loaded.
 */
export function productView(
  p: Product,
  state: InspectionState | null,
  opts: { allConductors?: boolean } = {},
) {
  const conductors = p.conductors
    .getItems()
    .filter((c) => opts.allConductors || c.active)
    .sort((a, b) => a.position - b.position || a.id - b.id);
  return {
    id: p.id,
    supplier: supplierRef(p.supplier),
    sku: p.sku,
    kind: p.kind,
    description: p.description,
    lengthPerUnitM: p.lengthPerUnitM,
    inspectionLevel: p.inspectionLevel,
    aql: p.aql,
    minAreaRatio: p.minAreaRatio,
    concessionNeedsApproval: p.concessionNeedsApproval,
    active: p.active,
    conductors: conductors.map(conductorView),
    inspectionState: inspectionStateView(state),
    warnings: productWarnings(conductors.filter((c) => c.active)),
    version: p.version,
    createdAt: p.createdAt,
    updatedAt: p.updatedAt,
  };
}
export type ProductView = ReturnType<typeof productView>;
