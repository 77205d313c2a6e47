import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { decisionView } from '../decisions/decision-view';
import { Decision } from '../decisions/entities/decision.entity';
import { Nonconformance } from '../decisions/entities/nonconformance.entity';
import { Lot } from '../lots/entities/lot.entity';
import { lotSummary, supplierWarning } from '../lots/lot-summary';
import { InspectionState } from '../products/entities/inspection-state.entity';
import { productView } from '../products/product-view';
import { Photo } from '../photos/entities/photo.entity';
import { photoView } from '../photos/photo-view';
import { Sample } from '../inspection/entities/sample.entity';
import { LotEvaluationService } from '../inspection/lot-evaluation';
import { sampleView } from '../inspection/views';

/**
 * LotDetail of docs/api-conventions.md: the lot with all its evidence and its evaluation.
 * The Lot page's read model sits above inspection, decisions and photos, whose records it
 * gathers; none of them imports it.
 */
@Injectable()
export class LotPageService {
  constructor(
    private readonly em: EntityManager,
    private readonly evaluation: LotEvaluationService,
  ) {}

  async detail(id: number) {
    const lot = await this.em.findOneOrFail(
      Lot,
      { id },
      {
        populate: ['supplier', 'product.supplier', 'receivedBy', 'product.conductors'],
      },
    );
    const [ofLot, state, photos, decisions, ncr] = await Promise.all([
      this.em.find(
        Sample,
        { lot },
        { populate: ['conductor', 'createdBy', 'readings.takenBy', 'readings.voidedBy'] },
      ),
      this.em.findOne(InspectionState, { product: lot.product }),
      this.em.find(
        Photo,
        { lot },
        { populate: ['uploadedBy', 'sample', 'voidedBy'], orderBy: { id: 'asc' } },
      ),
      this.em.find(
        Decision,
        { lot },
        { populate: ['decidedBy'], orderBy: { decidedAt: 'desc', id: 'desc' } },
      ),
      this.em.findOne(Nonconformance, { lot }, { orderBy: { id: 'desc' }, populate: ['decision'] }),
    ]);
    const samples = [...ofLot].sort(
      (a, b) => a.conductor.position - b.conductor.position || a.seq - b.seq,
    );
    return {
      ...lotSummary(lot),
      notes: lot.notes,
      supplierWarning: supplierWarning(lot.supplier),
      product: productView(lot.product, state, { allConductors: true }),
      samples: samples.map(sampleView),
      photos: photos.map(photoView),
      evaluation: this.evaluation.evaluateLoaded(lot, ofLot),
      decisions: decisions.map((d) =>
        decisionView(d, ncr && ncr.decision.id === d.id ? ncr.number : null),
      ),
      ncrNumber: ncr?.number ?? null,
    };
  }
}
