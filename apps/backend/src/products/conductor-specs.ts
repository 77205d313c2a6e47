import { DomainError, type FieldError } from '../common/domain-error';
import type { EntityManager } from '@mikro-orm/core';
import {
  DEFAULT_CONDUCTOR_CLASS,
  parseGauge,
  StandardsInputError,
  type Gauge,
} from '@gaugeproof/standards';
import type { ConductorDto } from './dto/conductor.dto';
import { ConductorSpec } from './entities/conductor-spec.entity';
import type { Product } from './entities/product.entity';

interface ParsedConductor extends ConductorDto {
  gaugeOf: Gauge;
  /** IEC 60228 class for a metric size (default 5), null for AWG. */
  classOf: number | null;
}

/**
 * Reads every label with parseGauge; a label it refuses is a 400 on the field
 * `conductors.1.gauge` (0-based, as the validation pipe names nested properties).
 */
export function parseConductors(list: readonly ConductorDto[]): ParsedConductor[] {
  const problems: FieldError[] = [];
  const parsed = list.map((c, i) => {
    try {
      const gaugeOf = parseGauge(c.gauge);
      const given = c.conductorClass ?? null;
      if (gaugeOf.system !== 'metric' && given !== null) {
        problems.push({
          field: `conductors.${i}.conductorClass`,
          message: `conductors[${i}].conductorClass: conductorClass is for metric (IEC 60228) sizes only; ${gaugeOf.label} is judged by its area (ASTM B258).`,
        });
      }
      // IEC 60228 class 5, the flexible class of vehicle power cable, by default (issue 13).
      const classOf = gaugeOf.system === 'metric' ? (given ?? DEFAULT_CONDUCTOR_CLASS) : null;
      return { ...c, gaugeOf, classOf };
    } catch (e) {
      if (!(e instanceof StandardsInputError)) throw e;
      problems.push({
        field: `conductors.${i}.gauge`,
        message: `conductors[${i}].gauge: ${e.message}`,
      });
      return null;
    }
  });
  if (problems.length) throw DomainError.invalid(problems);
  return parsed as ParsedConductor[];
}

const sameSpec = (spec: ConductorSpec, c: ParsedConductor, position: number) =>
  spec.active &&
  spec.position === position &&
  spec.purpose === c.purpose &&
  spec.gaugeLabel === c.gaugeOf.label &&
  spec.claimedMaterial === c.claimedMaterial &&
  spec.claimedStrands === (c.claimedStrands ?? null) &&
  spec.conductorClass === c.classOf;

/**
 * Makes `list` the product's active conductors. An unchanged spec at the same position is
 * kept as it is; the others are deactivated, never deleted, since lots and samples point
 * at them. The product's conductors collection must be loaded.
 */
export function replaceConductors(
  em: EntityManager,
  product: Product,
  list: readonly ParsedConductor[],
): void {
  const existing = product.conductors.getItems();
  const kept = new Set<ConductorSpec>();
  list.forEach((c, position) => {
    const same = existing.find((s) => !kept.has(s) && sameSpec(s, c, position));
    if (same) {
      kept.add(same);
      return;
    }
    const spec = em.create(ConductorSpec, {
      product,
      position,
      purpose: c.purpose,
      gaugeLabel: c.gaugeOf.label,
      gaugeSystem: c.gaugeOf.system,
      nominalAreaMm2: c.gaugeOf.nominalAreaMm2,
      claimedMaterial: c.claimedMaterial,
      claimedStrands: c.claimedStrands ?? null,
      conductorClass: c.classOf,
      active: true,
    });
    product.conductors.add(spec);
    kept.add(spec);
  });
  for (const spec of existing) if (!kept.has(spec)) spec.active = false;
}
