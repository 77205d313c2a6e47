import { Injectable, type OnModuleInit } from '@nestjs/common';
import { LotEvaluationService } from '../inspection/lot-evaluation';
import { Lot } from '../lots/entities/lot.entity';
import { NoticesService, type WatchRound } from '../notices/notices.service';
import { Decision } from './entities/decision.entity';

/**
 * Lots awaiting a decision, or held at their reject number, for the notices' scan: each
 * once per decision count, so a lot whose decision was superseded is noticed again.
 */
@Injectable()
export class AwaitingDecisionWatch implements OnModuleInit {
  constructor(
    private readonly notices: NoticesService,
    private readonly evaluations: LotEvaluationService,
  ) {}

  onModuleInit(): void {
    this.notices.watch('lot awaiting a decision', (round) => this.scan(round));
  }

  async scan({ em, noticed, raise }: WatchRound): Promise<number> {
    let stored = 0;
    const awaiting = await em.find(
      Lot,
      { status: 'awaiting_decision' },
      { populate: ['supplier', 'product'], orderBy: { id: 'asc' } },
    );
    for (const lot of awaiting) {
      const decided = await em.count(Decision, { lot: lot.id });
      const key = `lot_awaits:${lot.id}:${decided}`;
      if (await noticed(key)) continue;
      const evaluation = await this.evaluations.evaluate(lot, em);
      const atReject = evaluation.recommendation === 'reject';
      const url = this.notices.link(`/lots/${lot.id}`);
      const what = `lot ${lot.id} (PO ${lot.poNumber}, ${lot.supplier.name}, ${lot.product.sku})`;
      stored += await raise({
        kind: atReject ? 'lot_reject_number' : 'lot_awaits_decision',
        key,
        subject: atReject
          ? `Lot ${lot.id} reached its reject number: decide it`
          : `Lot ${lot.id} awaits your decision`,
        body: [
          atReject
            ? `${cap(what)} reached its reject number: ${evaluation.nonconforming} nonconforming of ${evaluation.samplesTested} tested (${evaluation.samplesPlanned} planned). It is held until a QA lead decides.`
            : `${cap(what)} has every planned unit tested (${evaluation.nonconforming} nonconforming of ${evaluation.samplesTested}) and awaits your decision.`,
          `Decide it here: ${url}`,
        ].join('\n\n'),
        wants: (c) => c.lotAwaitsDecision || (atReject && c.lotRejectNumber),
      });
    }
    return stored;
  }
}

const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
