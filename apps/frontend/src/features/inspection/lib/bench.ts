import type { Conductor, LotDetail, ReadingMethod, Sample } from '@/features/inspection/types';

/** One planned piece of the lot: unit `seq` of the plan, cut for one conductor. */
export interface BenchTarget {
  seq: number;
  conductor: Conductor;
  sample: Sample | undefined;
}

/** A piece counts as done once it has a live reading, whatever its verdict. */
export const isDone = (target: BenchTarget): boolean =>
  !!target.sample && target.sample.readings.some((r) => !r.voided);

/**
 * Every unit × conductor the plan asks for, in cutting order: unit 1 of every conductor
 * (kits are cut one kit at a time), then unit 2, … Units cut beyond the plan follow.
 */
export function benchTargets(lot: LotDetail): BenchTarget[] {
  const conductors = [...lot.product.conductors].sort((a, b) => a.position - b.position);
  const units = Math.max(lot.samplingPlan.sampleSize, ...lot.samples.map((s) => s.seq));
  const targets: BenchTarget[] = [];
  for (let seq = 1; seq <= units; seq++) {
    for (const conductor of conductors) {
      const sample = lot.samples.find((s) => s.seq === seq && s.conductorId === conductor.id);
      if (seq <= lot.samplingPlan.sampleSize || sample) targets.push({ seq, conductor, sample });
    }
  }
  return targets;
}

export const targetKey = (t: { seq: number; conductor: { id: number } }) =>
  `${t.seq}:${t.conductor.id}`;

/** The first planned piece without a live reading, after `afterKey` when given (wrapping round). */
export function nextTarget(
  targets: readonly BenchTarget[],
  afterKey?: string,
  pendingKeys: ReadonlySet<string> = new Set(),
): BenchTarget | undefined {
  const open = (t: BenchTarget) => !isDone(t) && !pendingKeys.has(targetKey(t));
  const start = afterKey ? targets.findIndex((t) => targetKey(t) === afterKey) + 1 : 0;
  return targets.slice(start).find(open) ?? targets.slice(0, start).find(open);
}

/**
 * The method a bench starts on. Mass over a measured length is the reference way to get a
 * stranded conductor's cross-section (ASTM B263); a solid conductor is measured across its
 * diameter with a micrometer (common practice, no source). The clerk may switch.
 */
export function preferredMethod(conductor: Conductor): ReadingMethod {
  return conductor.claimedStrands === 1 ? 'diameter' : 'mass';
}
