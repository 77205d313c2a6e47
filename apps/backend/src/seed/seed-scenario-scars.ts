import { addDays, isoDate } from '../common/calendar';
import { clock } from '../common/clock';
import { formatNumber, nextSeqInYear } from '../common/numbering';
import {
  CorrectiveAction,
  type CorrectiveActionStatus,
} from '../corrective-actions/entities/corrective-action.entity';
import type { Lot } from '../lots/entities/lot.entity';
import { User } from '../users/entities/user.entity';
import type { ScenarioContext } from './seed-scenario-context';
import { daysAgo, type LotByKey } from './seed-scenario-returns';

interface ScarStory {
  lots: Lot[];
  raised: number;
  dueInDays: number;
  problem: string;
  response?: { days: number; containment: string; rootCause: string; action: string };
  status: CorrectiveActionStatus;
}

/**
 * A supplier corrective action request (SCAR), raised by the buyer, perhaps answered on a
 * later day: each step written at its own time in the story.
 */
async function raiseScar(ctx: ScenarioContext, s: ScarStory): Promise<void> {
  const raisedAt = ctx.time.set(daysAgo(ctx, s.raised, 15));
  const year = raisedAt.getUTCFullYear();
  const record = (ca: CorrectiveAction, action: string, after: Record<string, unknown>) => {
    for (const lot of s.lots) {
      ctx.audit.record(ctx.em, ctx.users.buyer, {
        action,
        entityType: 'corrective_action',
        entityId: ca.id,
        lotId: lot.id,
        after: { number: ca.number, ...after },
      });
    }
  };
  const ca = await ctx.step(async () => {
    const created = ctx.em.create(CorrectiveAction, {
      number: formatNumber(
        'SCAR',
        year,
        await nextSeqInYear(ctx.em, CorrectiveAction, 'SCAR', year),
      ),
      supplier: s.lots[0].supplier,
      problem: s.problem,
      dueOn: addDays(isoDate(raisedAt), s.dueInDays),
      status: 'open',
      createdBy: ctx.em.getReference(User, ctx.users.buyer.id),
    });
    created.lots.set(s.lots);
    await ctx.em.flush();
    record(created, 'corrective_action.create', {
      problem: created.problem,
      dueOn: created.dueOn,
      status: 'open',
    });
    await ctx.em.flush();
    return created;
  });
  const response = s.response;
  if (!response) return;
  ctx.time.set(daysAgo(ctx, response.days, 11));
  await ctx.step(async () => {
    ca.status = s.status;
    ca.containment = response.containment;
    ca.rootCause = response.rootCause;
    ca.correctiveAction = response.action;
    ca.respondedAt = clock.now();
    record(ca, 'corrective_action.respond', { status: s.status, rootCause: ca.rootCause });
    await ctx.em.flush();
  });
}

/** The SCARs purchasing raised: one answered, one verified, one open past its due date. */
export async function seedScars(ctx: ScenarioContext, lot: LotByKey) {
  await raiseScar(ctx, {
    lots: [lot('qa4-cca-1')],
    raised: 132,
    dueInDays: 30,
    problem:
      'QA-4-CU100, sold as 4 AWG copper: all 6 units identified as copper-clad aluminium by mass and four-wire resistance; every unit far under the copper area of its label.',
    response: {
      days: 123,
      containment: 'Stock of the drum batch quarantined at our warehouse; open orders held.',
      rootCause: 'A new sub-supplier shipped CCA conductor under the copper part number.',
      action: 'Sub-supplier dropped; incoming resistance check added at our receiving.',
    },
    status: 'responded',
  });
  await raiseScar(ctx, {
    lots: [lot('vwk-5')],
    raised: 76,
    dueInDays: 30,
    problem:
      'VW-KIT-4: power leads labelled 4 AWG measure as 6 AWG on 2 of 13 kits; a remote lead labelled 18 AWG measures as 20 AWG.',
    response: {
      days: 70,
      containment: 'Kits from the same week sorted at our plant; short leads scrapped.',
      rootCause: 'Wrong reel of 6 AWG loaded on the kit cutting line after a changeover.',
      action: 'Reel labels scanned at the cutting line; first-kit check after changeovers.',
    },
    status: 'verified',
  });
  await raiseScar(ctx, {
    lots: [lot('qa4-cca-2'), lot('qak-3')],
    raised: 48,
    dueInDays: 30,
    problem:
      'Copper-clad aluminium again under the copper part number QA-4-CU100 (all 6 units), and kit grounds short of their label. Previous SCAR response not effective.',
    status: 'open',
  });
}
