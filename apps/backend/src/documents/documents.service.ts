import { DomainError } from '../common/domain-error';
import { Inject, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { Concession } from '../decisions/entities/concession.entity';
import { Decision } from '../decisions/entities/decision.entity';
import { ncrNumberOfLot } from '../decisions/decision-view';
import { Lot } from '../lots/entities/lot.entity';
import { lotTagPdf } from './lot-tag';

/** Lot statuses that are still on hold: not yet decided. */
const HELD: readonly string[] = ['on_hold', 'inspecting', 'awaiting_decision'];

const OUTCOME_WORDS: Record<string, string> = {
  accept: 'accepted',
  accept_on_concession: 'accepted on concession',
  reject: 'rejected',
};

/** Printable documents of a lot. */
@Injectable()
export class DocumentsService {
  constructor(
    private readonly em: EntityManager,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async lotTag(lotId: number): Promise<Buffer> {
    const lot = await this.em.findOne(Lot, lotId, { populate: ['product', 'supplier'] });
    if (!lot) throw DomainError.notFound(`There is no lot ${lotId}`);
    const decision = await this.em.findOne(
      Decision,
      { lot },
      { orderBy: { decidedAt: 'desc', id: 'desc' }, populate: ['decidedBy'] },
    );
    // The terms of the concession the lot's standing decision put in force.
    const concession =
      decision?.outcome === 'accept_on_concession'
        ? await this.em.findOne(
            Concession,
            { decision: decision.id, status: 'approved' },
            { populate: ['reviewedBy'] },
          )
        : null;
    return lotTagPdf({
      concession: concession
        ? {
            scope: concession.scope,
            quantity: `${concession.quantity} ${lot.unit}`,
            expiresOn: concession.expiresOn,
            approvedBy: concession.reviewedBy?.name ?? '—',
          }
        : null,
      lotId: lot.id,
      status: lot.status,
      poNumber: lot.poNumber,
      sku: lot.product.sku,
      description: lot.product.description,
      supplier: `${lot.supplier.name} (${lot.supplier.code})`,
      receivedAt: lot.receivedAt,
      quantity: `${lot.quantity} ${lot.unit}`,
      decision: decision
        ? `${OUTCOME_WORDS[decision.outcome]} by ${decision.decidedBy.name}`
        : null,
      decidedAt: decision?.decidedAt ?? null,
      ncrNumber: await ncrNumberOfLot(this.em, lot.id),
      // A held lot's tag opens bench mode, where the clerk records its samples; a decided
      // lot's tag opens its page.
      url: HELD.includes(lot.status)
        ? `${this.config.publicUrl}/lots/${lot.id}/bench`
        : `${this.config.publicUrl}/lots/${lot.id}`,
    });
  }
}
