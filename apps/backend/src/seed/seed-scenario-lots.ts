import { Sample } from '../inspection/entities/sample.entity';
import { Lot } from '../lots/entities/lot.entity';
import type { ScenarioContext } from './seed-scenario-context';
import type { InstrumentBench } from './seed-scenario-instruments';
import { inspect } from './seed-scenario-inspect';
import { photograph } from './seed-scenario-photos';
import type { LotStory } from './seed-scenario-story';

const DAY_MS = 86_400_000;

/** When the story's lot came in: a weekday-morning delivery, or a few hours ago for today's. */
export function receivedAt(ctx: ScenarioContext, story: LotStory): Date {
  if (story.daysAgo === 0) return new Date(ctx.now.getTime() - 5 * 3_600_000);
  const midnight = Date.UTC(ctx.now.getUTCFullYear(), ctx.now.getUTCMonth(), ctx.now.getUTCDate());
  const minutes = 7 * 60 + 20 + ctx.rnd.int(0, 90);
  return new Date(midnight - story.daysAgo * DAY_MS + minutes * 60_000);
}

const REASONS = {
  accept: 'Every planned unit conforms; released to stock.',
  reject: 'Nonconforming units found; lot held for return to the supplier.',
} as const;

/** The QA lead's decision the next morning, through the real decision service. */
async function decide(ctx: ScenarioContext, lot: Lot, story: LotStory, received: Date) {
  if (story.decision === 'none' || story.daysAgo < 2) return;
  const evaluation = await ctx.evaluations.evaluate(lot, ctx.em);
  if (evaluation.recommendation === 'incomplete') return;
  const chosen = story.decision ?? {
    outcome: evaluation.recommendation,
    reason: REASONS[evaluation.recommendation],
  };
  ctx.time.set(new Date(received.getTime() + DAY_MS + ctx.rnd.int(60, 180) * 60_000));
  const terms = story.concession;
  await ctx.step(async () => {
    const result = await ctx.decisions.decide(
      lot.id,
      {
        outcome: chosen.outcome,
        reason: chosen.reason,
        version: lot.version,
        concession: terms
          ? {
              scope: terms.scope,
              quantity: terms.quantity,
              expiresOn: new Date(ctx.time.now.getTime() + terms.days * DAY_MS)
                .toISOString()
                .slice(0, 10),
            }
          : undefined,
      },
      ctx.users.qa,
    );
    if (result.pendingApproval && result.concession) {
      // Against a reject, the admin approves the QA lead's concession (the product's policy).
      await ctx.decisions.approve(
        result.concession.id,
        { version: result.concession.version, note: 'Terms agreed with engineering.' },
        ctx.users.admin,
      );
    }
  });
}

/** Receives one lot of the story, inspects it and decides it, each step at the story's time. */
export async function runLot(
  ctx: ScenarioContext,
  bench: InstrumentBench,
  story: LotStory,
  index: number,
): Promise<Lot> {
  const product = ctx.catalog.products[story.product];
  const received = ctx.time.set(receivedAt(ctx, story));
  const stamp = received.toISOString().slice(2, 10).replace(/-/g, '');
  const created = await ctx.step(() =>
    ctx.lots.create(
      {
        productId: product.id,
        poNumber: `PO-${26100 + index * 3}`,
        packingSlip: `PS-${stamp}-${index + 1}`,
        supplierLotCode: `${product.supplier.code}-${stamp}`,
        quantity: story.quantity,
        unit: story.unit,
      },
      ctx.users.clerk,
    ),
  );
  const load = () => ctx.em.findOneOrFail(Lot, created.id, { populate: ['product.conductors'] });
  await inspect(ctx, bench, await load(), story);
  // The reading writer wrote readings, lot status and version with SQL: read them afresh.
  ctx.em.clear();
  const lot = await load();
  if (story.photo) {
    const first = await ctx.em.findOne(Sample, { lot, seq: 1 }, { orderBy: { id: 'asc' } });
    await photograph(ctx, lot, first, story.photo);
  }
  await decide(ctx, lot, story, received);
  return lot;
}
