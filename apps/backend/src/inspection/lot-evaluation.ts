import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { lotOutcome } from '@gaugeproof/standards';
import { Lot } from '../lots/entities/lot.entity';
import { standardsPlan, type StoredSamplingPlan } from '../products/sampling-plan';
import type { Reading } from './entities/reading.entity';
import { Sample } from './entities/sample.entity';

export type SampleVerdict = 'conforms' | 'nonconforming' | 'inconclusive' | 'untested';
export type Recommendation = 'accept' | 'reject' | 'incomplete';

export interface Evaluation {
  samplesPlanned: number;
  samplesTested: number;
  nonconforming: number;
  inconclusive: number;
  recommendation: Recommendation;
  message: string;
}

/**
 * A sample's verdict from its non-voided readings: nonconforming when any reading is,
 * else inconclusive when any is, else conforms; untested without readings (issue 5 §1).
 */
export function sampleVerdict(
  readings: readonly Pick<Reading, 'voided' | 'verdict'>[],
): SampleVerdict {
  const live = readings.filter((r) => !r.voided);
  if (live.length === 0) return 'untested';
  if (live.some((r) => r.verdict === 'nonconforming')) return 'nonconforming';
  if (live.some((r) => r.verdict === 'inconclusive')) return 'inconclusive';
  return 'conforms';
}

/** What the evaluation needs of a sample: its unit number, conductor and verdict. */
export interface UnitSample {
  seq: number;
  conductorId: number;
  verdict: SampleVerdict;
}

/**
 * Counts by unit, as ISO 2859-1 counts nonconforming units: a unit is nonconforming when any
 * of its samples is (that alone decides it, so it counts as tested); otherwise it is tested
 * when every active conductor has a sample with a reading, and inconclusive when any of
 * those is. Reject as soon as the reject number is reached; incomplete while planned units
 * are untested or while the inconclusive units could still reach the reject number.
 */
export function evaluateUnits(
  plan: StoredSamplingPlan,
  lotSize: number,
  conductorIds: readonly number[],
  samples: readonly UnitSample[],
): Evaluation {
  const planned = plan.sampleSize;
  let tested = 0;
  let nonconforming = 0;
  let inconclusive = 0;
  for (let seq = 1; seq <= planned; seq++) {
    const ofUnit = samples.filter((s) => s.seq === seq);
    if (ofUnit.some((s) => s.verdict === 'nonconforming')) {
      tested++;
      nonconforming++;
      continue;
    }
    const complete = conductorIds.every((id) =>
      ofUnit.some((s) => s.conductorId === id && s.verdict !== 'untested'),
    );
    if (!complete) continue;
    tested++;
    if (ofUnit.some((s) => s.verdict === 'inconclusive')) inconclusive++;
  }
  const base = { samplesPlanned: planned, samplesTested: tested, nonconforming, inconclusive };
  const counts = `${tested} of ${planned} units tested, ${nonconforming} nonconforming${inconclusive ? `, ${inconclusive} inconclusive` : ''}`;
  if (nonconforming >= plan.reject) {
    return {
      ...base,
      recommendation: 'reject',
      message: `Reject: ${counts}; the plan rejects at ${plan.reject} (accepts at ${plan.accept} or fewer).`,
    };
  }
  if (tested < planned) {
    return {
      ...base,
      recommendation: 'incomplete',
      message: `Incomplete: ${counts}; ${planned - tested} planned unit(s) still to test.`,
    };
  }
  if (inconclusive > 0 && nonconforming + inconclusive >= plan.reject) {
    return {
      ...base,
      recommendation: 'incomplete',
      message: `Incomplete: ${counts}; the inconclusive units could still reach the reject number ${plan.reject}: measure them again with a longer sample or another method.`,
    };
  }
  const outcome = lotOutcome(standardsPlan(plan, lotSize), nonconforming);
  if (outcome === 'reject') {
    return { ...base, recommendation: 'reject', message: `Reject: ${counts}.` };
  }
  const back =
    outcome === 'accept_and_return_to_normal'
      ? ' On reduced inspection this count returns the supplier to normal inspection.'
      : '';
  return {
    ...base,
    recommendation: 'accept',
    message: `Accept: ${counts}; the plan accepts at ${plan.accept} or fewer.${back}`,
  };
}

/** Evaluation of a lot from its stored plan and its samples' non-voided readings. */
@Injectable()
export class LotEvaluationService {
  constructor(private readonly em: EntityManager) {}

  /** Pass the EntityManager of a running transaction to evaluate inside it. */
  async evaluate(lotOrId: Lot | number, em: EntityManager = this.em): Promise<Evaluation> {
    const lot =
      typeof lotOrId === 'number' ? await em.findOneOrFail(Lot, { id: lotOrId }) : lotOrId;
    await em.populate(lot, ['product.conductors']);
    const samples = await em.find(Sample, { lot }, { populate: ['readings', 'conductor'] });
    return this.evaluateLoaded(lot, samples);
  }

  /** For a lot whose product conductors are loaded, and its samples with their readings. */
  evaluateLoaded(lot: Lot, ofLot: readonly Sample[]): Evaluation {
    const conductorIds = lot.product.conductors
      .getItems()
      .filter((c) => c.active)
      .map((c) => c.id);
    const samples = ofLot.map((s) => ({
      seq: s.seq,
      conductorId: s.conductor.id,
      verdict: sampleVerdict(s.readings.getItems()),
    }));
    return evaluateUnits(lot.samplingPlan, lot.quantity, conductorIds, samples);
  }
}
