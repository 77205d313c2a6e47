import { Nonconformance } from '../decisions/entities/nonconformance.entity';
import type { Lot } from '../lots/entities/lot.entity';
import { OutboundMessage } from '../mail/entities/outbound-message.entity';
import { money } from '../returns/return-money';
import type { ReturnCosts } from '../returns/entities/vendor-return.entity';
import { clock } from '../common/clock';
import { DEMO_CURRENCY, type ScenarioContext } from './seed-scenario-context';

const DAY_MS = 86_400_000;
export const daysAgo = (ctx: ScenarioContext, days: number, hour = 10) =>
  new Date(
    Date.UTC(ctx.now.getUTCFullYear(), ctx.now.getUTCMonth(), ctx.now.getUTCDate(), hour) -
      days * DAY_MS,
  );

interface ReturnStory {
  lot: Lot;
  rmaNumber: string;
  costs: ReturnCosts;
  notes: string;
  /** ISO 4217 code; the demo shop's (DEMO_CURRENCY) when not given, whatever CURRENCY says. */
  currency?: string;
  /** Days ago of each step: raised, then e-mailed (shipped, acknowledged, credited, closed when given). */
  steps: number[];
  mail: 'sent' | 'logged';
}

/** A return to vendor of a rejected lot, through the real returns service, e-mailed once. */
async function returnLot(ctx: ScenarioContext, r: ReturnStory): Promise<void> {
  const [raised, ...later] = r.steps;
  ctx.time.set(daysAgo(ctx, raised, 14));
  const view = await ctx.step(() =>
    ctx.returns.create(
      {
        lotIds: [r.lot.id],
        rmaNumber: r.rmaNumber,
        notes: r.notes,
        costs: r.costs,
        currency: r.currency ?? DEMO_CURRENCY,
      },
      ctx.users.buyer,
    ),
  );
  const steps: ((at: Date) => Promise<unknown>)[] = [
    async () => {
      await ctx.returns.markEmailed(view.id, ctx.users.buyer);
      mailReturn(ctx, r, view.id, view.number, money(view.chargebackTotal, view.currency));
    },
    (at) =>
      ctx.returns.ship(
        view.id,
        {
          carrier: 'Harbourline Freight',
          trackingNumber: `HF${r.rmaNumber.replace(/\D/g, '')}07`,
          shippedOn: at.toISOString().slice(0, 10),
          quantity: r.lot.quantity,
        },
        ctx.users.buyer,
      ),
    () => ctx.returns.acknowledge(view.id, {}, ctx.users.buyer),
    () =>
      ctx.returns.credit(
        view.id,
        { creditNoteNumber: `CN-${r.rmaNumber.slice(-4)}`, creditAmount: view.chargebackTotal },
        ctx.users.buyer,
      ),
    () => ctx.returns.close(view.id, {}, ctx.users.buyer),
  ];
  for (const [i, days] of later.entries()) {
    const at = ctx.time.set(daysAgo(ctx, days, 9));
    await ctx.step(() => steps[i](at));
  }
  const ncr = await ctx.em.findOneOrFail(Nonconformance, { lot: r.lot });
  ncr.disposition = 'return_to_vendor';
  await ctx.em.flush();
}

/** The e-mail of the return as the mail service would record it (no SMTP in the story). */
function mailReturn(
  ctx: ScenarioContext,
  r: ReturnStory,
  id: number,
  number: string,
  total: string,
) {
  const supplier = r.lot.supplier;
  const message = ctx.em.create(OutboundMessage, {
    to: supplier.contactEmail ?? `quality@${supplier.code.toLowerCase()}.example`,
    subject: `Return ${number}: rejected cable from ${supplier.name}`,
    body: [
      `Return to vendor ${number}, your RMA ${r.rmaNumber}.`,
      `We rejected lot ${r.lot.id} (PO ${r.lot.poNumber}) at receiving inspection: the attached evidence pack shows the sampling plan, every reading with its uncertainty and the decision; the CSV holds the readings.`,
      `Chargeback: ${total}.`,
      'Please confirm the return and send us your corrective action.',
    ].join('\n\n'),
    attachments: [
      { filename: `${number}-readings.csv`, contentType: 'text/csv; charset=utf-8' },
      { filename: `${number}-evidence.pdf`, contentType: 'application/pdf' },
    ],
    status: r.mail,
    attempts: 1,
    relatedType: 'vendor_return',
    relatedId: id,
    sentById: ctx.users.buyer.id,
    sentAt: r.mail === 'sent' ? clock.now() : null,
  });
  ctx.em.persist(message);
  ctx.audit.record(ctx.em, ctx.users.buyer, {
    action: 'return.email',
    entityType: 'vendor_return',
    entityId: id,
    lotId: r.lot.id,
    after: { number, to: message.to, status: message.status, error: null },
  });
}

/** The story's lot, freshly loaded with its supplier. */
export type LotByKey = (key: string) => Lot;

/** What purchasing did about the copper-clad aluminium: two returns with chargebacks. */
export async function seedReturns(ctx: ScenarioContext, lot: LotByKey) {
  await returnLot(ctx, {
    lot: lot('qa4-cca-1'),
    rmaNumber: 'QAS-RMA-5521',
    costs: { inspectionHours: 3.5, hourlyRate: 48, freight: 85 },
    notes: 'Sold as copper; mass and four-wire resistance identify copper-clad aluminium.',
    steps: [132, 131, 130, 126, 118, 112],
    mail: 'sent',
  });
  await returnLot(ctx, {
    lot: lot('qa4-cca-2'),
    rmaNumber: 'QAS-RMA-5870',
    costs: { inspectionHours: 4, hourlyRate: 48, freight: 95, other: 30 },
    notes: 'Second delivery of copper-clad aluminium sold as copper; see SCAR.',
    // Invoiced by the supplier's export office in US dollars: its scorecard shows two
    // currencies (the shop's EUR and this USD), never added together.
    currency: 'USD',
    steps: [48, 47, 46],
    mail: 'logged',
  });
}
