import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { decisionsOfLot, type DecisionView } from '../decisions/decision-view';
import { Reading } from '../inspection/entities/reading.entity';
import { LotEvaluationService, type Evaluation } from '../inspection/lot-evaluation';
import { Lot } from '../lots/entities/lot.entity';
import { Photo } from '../photos/entities/photo.entity';
import type { VendorReturn } from './entities/vendor-return.entity';

export interface LotEvidence {
  lot: Lot;
  evaluation: Evaluation;
  decisions: DecisionView[];
  readings: Reading[];
  photos: Photo[];
}

/** Everything the evidence pack shows about the lots of a return. */
@Injectable()
export class ReturnEvidence {
  constructor(
    private readonly em: EntityManager,
    private readonly evaluations: LotEvaluationService,
  ) {}

  private lotIds(ret: VendorReturn): number[] {
    return ret.lots
      .getItems()
      .map((l) => l.id)
      .sort((a, b) => a - b);
  }

  /** The readings of a lot, in blocks of 500, oldest unit first. */
  private async *readingBlocks(em: EntityManager, lotId: number): AsyncGenerator<Reading[]> {
    for (let offset = 0; ; offset += 500) {
      const rows = await em.find(
        Reading,
        { sample: { lot: lotId } },
        {
          populate: ['sample.conductor'],
          orderBy: { sample: { seq: 'asc', conductor: { position: 'asc' } }, id: 'asc' },
          limit: 500,
          offset,
        },
      );
      if (rows.length) yield rows;
      if (rows.length < 500) return;
    }
  }

  async lots(ret: VendorReturn): Promise<LotEvidence[]> {
    const em = this.em.fork();
    const out: LotEvidence[] = [];
    for (const id of this.lotIds(ret)) {
      const lot = await em.findOneOrFail(Lot, id, { populate: ['product.conductors', 'supplier'] });
      const readings: Reading[] = [];
      for await (const block of this.readingBlocks(em, id)) readings.push(...block);
      out.push({
        lot,
        evaluation: await this.evaluations.evaluate(lot, em),
        decisions: await decisionsOfLot(em, id),
        readings,
        // A voided photo is no evidence: it stays on the Lot page only (issue 15).
        photos: await em.find(
          Photo,
          { lot: id, voided: false },
          { orderBy: { id: 'asc' }, limit: 12 },
        ),
      });
    }
    return out;
  }
}
