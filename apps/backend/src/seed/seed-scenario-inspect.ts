import { parseGauge } from '@gaugeproof/standards';
import type { ReadingMethod } from '../inspection/entities/reading.entity';
import type { Sample } from '../inspection/entities/sample.entity';
import type { ReadingInputs } from '../inspection/reading-compute';
import { ReadingsRefused } from '../inspection/reading-writer';
import type { Lot } from '../lots/entities/lot.entity';
import type { ConductorSpec } from '../products/entities/conductor-spec.entity';
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
 * Cuts one unit's sample of a conductor and records its readings through the application's
 * one reading write path (ReadingWriter), as a clerk's entries would be, at the story's
 * time (each step inside `ctx.step`), with instruments in calibration on the story's day.
 */
class Bench {
  constructor(
    private readonly ctx: ScenarioContext,
    private readonly instruments: InstrumentBench,
    private readonly lot: Lot,
  ) {}

  async cut(c: ConductorSpec, seq: number, unitRef: string): Promise<Sample> {
    const { ctx } = this;
    ctx.time.advance(ctx.rnd.between(1, 3));
    return ctx.step(async () => {
      const [sample] = await ctx.samples.add(
        ctx.em,
        this.lot,
        [{ conductor: c, seq, unitRef }],
        ctx.users.clerk,
      );
      await ctx.em.flush();
      return sample;
    });
  }

  /** `confirmUnusual`: the clerk confirmed a reading the plausibility checks question. */
  async read(sample: Sample, method: ReadingMethod, inputs: ReadingInputs, confirmUnusual = false) {
    const { ctx } = this;
    ctx.time.advance(ctx.rnd.between(1.5, 4));
    const instruments = this.instruments.for(method, ctx.time.now);
    const entry = {
      sampleId: sample.id,
      method,
      inputs,
      instrumentIds: instruments.map((i) => i.id),
      confirmUnusual,
    };
    try {
      const [reading] = await ctx.step(() =>
        ctx.writer.write([entry], ctx.users.clerk, { em: ctx.em }),
      );
      return reading;
    } catch (e) {
      throw e instanceof ReadingsRefused ? e.refusals[0].error : e;
    }
  }
}

/** Cuts and measures the planned units; a typo, where the story has one, is voided by QA. */
export async function inspect(
  ctx: ScenarioContext,
  instruments: InstrumentBench,
  lot: Lot,
  story: LotStory,
): Promise<void> {
  const measured = story.measured ?? lot.samplingPlan.sampleSize;
  if (measured === 0) return;
  ctx.time.advance(ctx.rnd.between(50, 140));
  const bench = new Bench(ctx, instruments, lot);
  const conductors = lot.product.conductors.getItems().filter((c) => c.active);
  for (let seq = 1; seq <= measured; seq++) {
    for (const c of conductors) {
      const unitRef =
        story.unit === 'kits' ? `kit ${4100 + seq * 7}` : `${story.unit.slice(0, -1)} ${seq}`;
      const sample = await bench.cut(c, seq, unitRef);
      const piece = truePiece(ctx, story, c, seq);
      const mass = massInputs(piece, ctx.rnd);
      if (story.voided && seq === 2 && c === conductors[0]) {
        // The slip is questioned (ten times the nominal mass per metre); the clerk confirmed
        // it, and QA voids it below.
        const typo = await bench.read(
          sample,
          'mass',
          { ...mass, lengthMm: Math.round(mass.lengthMm! / 10) },
          true,
        );
        ctx.time.advance(1);
        await ctx.step(() => ctx.writer.void(typo.id, story.voided!, ctx.users.qa, { em: ctx.em }));
      }
      await bench.read(sample, 'mass', mass);
      const now = ctx.time.now;
      if ((story.resistance === 'all' || seq === 1) && instruments.covers('resistance', now)) {
        await bench.read(sample, 'resistance', resistanceInputs(piece, ctx.rnd));
      }
      if (story.strands && seq === 1 && c.claimedStrands && instruments.covers('strands', now)) {
        await bench.read(sample, 'strands', strandInputs(piece, ctx.rnd));
      }
    }
  }
}
