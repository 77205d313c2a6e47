import { Inject, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { listCsv, supplierCsv } from './scorecard-csv';
import type { ScorecardRange } from './scorecard-range';
import { ScorecardsService } from './scorecards.service';

/** CSV exports of the scorecards; every export is recorded in the audit log. */
@Injectable()
export class ScorecardExportService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly scorecards: ScorecardsService,
    @Inject(APP_CONFIG) private readonly config: Pick<AppConfig, 'currency'>,
  ) {}

  async list(range: ScorecardRange, actor: RequestUser): Promise<string> {
    const { items } = await this.scorecards.list(range);
    this.audit.record(this.em, actor, {
      action: 'scorecard.export',
      entityType: 'scorecard',
      after: { from: range.from, to: range.to, rows: items.length },
    });
    await this.em.flush();
    return listCsv(range.from, range.to, items, this.config.currency);
  }

  async supplier(supplierId: number, range: ScorecardRange, actor: RequestUser): Promise<string> {
    const card = await this.scorecards.forSupplier(supplierId, range);
    this.audit.record(this.em, actor, {
      action: 'scorecard.export',
      entityType: 'supplier',
      entityId: supplierId,
      after: { from: range.from, to: range.to },
    });
    await this.em.flush();
    return supplierCsv(card, this.config.currency);
  }
}
