import { auditShape } from '../inspection/reading-rules';
import { parseGauge, type MaterialId } from '@gaugeproof/standards';
import { Reading, type ReadingMethod } from '../inspection/entities/reading.entity';
import { Sample } from '../inspection/entities/sample.entity';
import { resolutionsFor, snapshot } from '../inspection/instrument-resolutions';
import { computeReading, type ReadingInputs } from '../inspection/reading-compute';
import type { Lot } from '../lots/entities/lot.entity';
import type { ConductorSpec } from '../products/entities/conductor-spec.entity';
import { User } from '../users/entities/user.entity';
import type { ScenarioContext } from './seed-scenario-context';
import type { InstrumentBench } from './seed-scenario-instruments';
import {
  massInputs,
  resistanceInputs,
  strandInputs,
  type TruePiece,
} from './seed-scenario-readings';
import type { LotStory } from './seed-scenario-story';

/** The metal and area the invented piece really has; a good cable sits just over its size. */
function truePiece(
  ctx: ScenarioContext,
  story: LotStory,
  c: ConductorSpec,
  seq: number,
): TruePiece {
  const fault = story.faults?.[c.purpose];
  const faulty = fault?.units.includes(seq) ?? false;
  const size =
    faulty && fault?.realGauge ? parseGauge(fault.realGauge).nominalAreaMm2 : c.nominalAreaMm2;
  const ratio = faulty && fault?.ratio ? fault.ratio : 1.006 + ctx.rnd.jitter(0.003);
  const strands = c.claimedStrands ?? Math.max(7, Math.round(c.nominalAreaMm2 / 0.0507));
  return { metal: faulty && fault?.cca ? 'cca10' : 'copper', areaMm2: size * ratio, strands };
}

/**
 * Cuts one unit's sample of a conductor and records its readings, each computed as the
 * reading service computes it (reading-compute with the instruments' resolutions and the
 * sample's earlier live readings), with instruments in calibration on the story's day.
 */
class Bench {
  readonly created: { sample: Sample; readings: Reading[] }[] = [];

  constructor(
    private readonly ctx: ScenarioContext,
    private readonly instruments: InstrumentBench,
    private readonly lot: Lot,
  ) {}

  cut(c: ConductorSpec, seq: number, unitRef: string): Sample {
    const { ctx } = this;
    ctx.clock.advance(ctx.rnd.between(1, 3));
    const sample = ctx.em.create(Sample, {
      lot: this.lot,
      conductor: c,
      seq,
      unitRef,
      createdBy: ctx.em.getReference(User, ctx.users.clerk.id),
      createdAt: new Date(ctx.clock.now),
    });
    this.created.push({ sample, readings: [] });
    return sample;
  }

  read(sample: Sample, method: ReadingMethod, inputs: ReadingInputs): Reading {
    const { ctx } = this;
    ctx.clock.advance(ctx.rnd.between(1.5, 4));
    const instruments = this.instruments.for(method, ctx.clock.now);
    const entry = this.created.find((e) => e.sample === sample) as Bench['created'][number];
    const live = entry.readings.filter((r) => !r.voided).reverse();
    const computed = computeReading({
      method,
      inputs,
      resolutions: resolutionsFor(method, instruments),
      gaugeLabel: sample.conductor.gaugeLabel,
      claimedMaterial: sample.conductor.claimedMaterial as MaterialId,
      minAreaRatio: this.lot.product.minAreaRatio,
      siblings: live.map((r) => ({ method: r.method, inputs: r.inputs, areaMm2: r.areaMm2 })),
    });
    const reading = ctx.em.create(Reading, {
      sample,
      method,
      inputs: inputs as Record<string, number>,
      instruments: instruments.map(snapshot),
      ...computed,
      takenBy: ctx.em.getReference(User, ctx.users.clerk.id),
      takenAt: new Date(ctx.clock.now),
    });
    entry.readings.push(reading);
    return reading;
  }

  /** Stores what was cut and read, then audits each step at the time it happened. */
  async save(): Promise<void> {
    const { ctx } = this;
    const at = ctx.clock.now;
    await ctx.em.flush();
    for (const { sample, readings } of this.created) {
      ctx.clock.set(sample.createdAt);
      ctx.audit.record(ctx.em, ctx.users.clerk, {
        action: 'sample.create',
        entityType: 'sample',
        entityId: sample.id,
        lotId: this.lot.id,
        after: { seq: sample.seq, conductorId: sample.conductor.id, unitRef: sample.unitRef },
      });
      for (const r of readings) {
        ctx.clock.set(r.takenAt);
        ctx.audit.record(ctx.em, ctx.users.clerk, {
          action: 'reading.create',
          entityType: 'reading',
          entityId: r.id,
          lotId: this.lot.id,
          // As entered: a reading voided later was live when it was created.
          after: auditShape({ ...r, sampleId: sample.id, voided: false, voidReason: null }),
        });
      }
    }
    ctx.clock.set(at);
    this.created.length = 0;
    await ctx.em.flush();
  }
}

/** Cuts and measures the planned units: the first one alone (the lot goes to inspecting). */
export async function inspect(
  ctx: ScenarioContext,
  instruments: InstrumentBench,
  lot: Lot,
  story: LotStory,
): Promise<void> {
  const measured = story.measured ?? lot.samplingPlan.sampleSize;
  if (measured === 0) return;
  ctx.clock.advance(ctx.rnd.between(50, 140));
  const bench = new Bench(ctx, instruments, lot);
  const conductors = lot.product.conductors.getItems().filter((c) => c.active);
  let typo: Reading | null = null;
  for (let seq = 1; seq <= measured; seq++) {
    for (const c of conductors) {
      const unitRef =
        story.unit === 'kits' ? `kit ${4100 + seq * 7}` : `${story.unit.slice(0, -1)} ${seq}`;
      const sample = bench.cut(c, seq, unitRef);
      const piece = truePiece(ctx, story, c, seq);
      const mass = massInputs(piece, ctx.rnd);
      if (story.voided && seq === 2 && c === conductors[0]) {
        typo = bench.read(sample, 'mass', { ...mass, lengthMm: Math.round(mass.lengthMm! / 10) });
        typo.voided = true; // voided through the service below, before the next reading
      }
      bench.read(sample, 'mass', mass);
      const now = ctx.clock.now;
      if ((story.resistance === 'all' || seq === 1) && instruments.covers('resistance', now)) {
        bench.read(sample, 'resistance', resistanceInputs(piece, ctx.rnd));
      }
      if (story.strands && seq === 1 && c.claimedStrands && instruments.covers('strands', now)) {
        bench.read(sample, 'strands', strandInputs(piece, ctx.rnd));
      }
    }
    if (seq === 1) {
      await bench.save();
      await ctx.lotStatus.refresh(ctx.em, lot, ctx.users.clerk);
    }
  }
  if (typo) typo.voided = false;
  await bench.save();
  if (typo) {
    const at = ctx.clock.now;
    ctx.clock.set(new Date(typo.takenAt.getTime() + 60_000));
    await ctx.readings.void(typo.id, { reason: story.voided as string }, ctx.users.qa);
    typo.voidedAt = new Date(ctx.clock.now);
    ctx.clock.set(at);
  }
  await ctx.lotStatus.refresh(ctx.em, lot, ctx.users.clerk);
}
