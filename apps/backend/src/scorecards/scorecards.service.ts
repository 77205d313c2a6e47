import { DomainError } from '../common/domain-error';
import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { isoDate } from '../common/calendar';
import { CONDUCTOR_PURPOSES } from '../products/entities/conductor-spec.entity';
import { Supplier } from '../suppliers/entities/supplier.entity';
import { assembleRow, compareWorstFirst, type SupplierIdentity } from './scorecard-assemble';
import { ScorecardCache } from './scorecard-cache';
import { ChangeCounters } from '../common/change-counters';
import type { ScorecardRange } from './scorecard-range';
import type { ScorecardList, ScorecardRow, SupplierScorecard } from '@gaugeproof/api-types';
import { SupplierDetailQuery } from './supplier-detail.query';
import { SupplierMetricsQuery } from './supplier-metrics.query';
import { clock } from '../common/clock';

const byPurposeOrder = (a: { purpose: string }, b: { purpose: string }) =>
  (CONDUCTOR_PURPOSES as readonly string[]).indexOf(a.purpose) -
  (CONDUCTOR_PURPOSES as readonly string[]).indexOf(b.purpose);

/** Supplier scorecards from SQL aggregates over lots, samples, readings, SCARs and returns. */
@Injectable()
export class ScorecardsService {
  constructor(
    private readonly em: EntityManager,
    private readonly metrics: SupplierMetricsQuery,
    private readonly detail: SupplierDetailQuery,
    private readonly cache: ScorecardCache,
    private readonly changes: ChangeCounters,
  ) {}

  private async rows(range: ScorecardRange, suppliers: SupplierIdentity[], supplierId?: number) {
    const today = isoDate(clock.now());
    const [lots, readings, samples, units, cars, chargebacks] = await Promise.all([
      this.metrics.lotsByMonth(range, supplierId),
      this.metrics.readingsByMonth(range, supplierId),
      this.metrics.samplesByPurpose(range, supplierId),
      this.metrics.units(range, supplierId),
      this.metrics.correctiveActions(range, today, supplierId),
      this.metrics.chargebacks(range, supplierId),
    ]);
    return suppliers.map((s) =>
      assembleRow(s, range.months, {
        lots: lots.filter((r) => r.supplierId === s.id),
        readings: readings.filter((r) => r.supplierId === s.id),
        samples: samples.filter((r) => r.supplierId === s.id),
        units: units.find((r) => r.supplierId === s.id),
        correctiveActions: cars.find((r) => r.supplierId === s.id),
        chargebacks: chargebacks.get(s.id) ?? [],
      }),
    );
  }

  /**
   * One row per supplier, suppliers without lots included; worst first. Kept until the
   * database's change counters show a write to what it counts (ScorecardCache); the day is
   * part of the key (overdue SCARs).
   */
  async list(range: ScorecardRange): Promise<ScorecardList> {
    const key = `${range.start.toISOString()}|${range.end.toISOString()}|${isoDate(clock.now())}`;
    return this.cache.list(await this.changes.read(), key, () => this.computeList(range));
  }

  private async computeList(range: ScorecardRange): Promise<ScorecardList> {
    const suppliers = await this.em.find(
      Supplier,
      {},
      { fields: ['id', 'name', 'code', 'status'], orderBy: { name: 'asc' } },
    );
    const items: ScorecardRow[] = await this.rows(range, suppliers);
    items.sort(compareWorstFirst);
    return { from: range.from, to: range.to, items };
  }

  async forSupplier(supplierId: number, range: ScorecardRange): Promise<SupplierScorecard> {
    const supplier = await this.em.findOne(
      Supplier,
      { id: supplierId },
      { fields: ['id', 'name', 'code', 'status'] },
    );
    if (!supplier) throw DomainError.notFound(`Supplier ${supplierId} not found`);
    const [[row], histogram, purposes, products, worstLots] = await Promise.all([
      this.rows(range, [supplier], supplierId),
      this.detail.histogram(range, supplierId),
      this.metrics.samplesByPurpose(range, supplierId),
      this.detail.products(supplierId),
      this.detail.worstLots(range, supplierId),
    ]);
    return {
      ...row,
      from: range.from,
      to: range.to,
      histogram,
      byPurpose: [...purposes].sort(byPurposeOrder).map((p) => ({
        purpose: p.purpose,
        samplesTested: p.tested,
        nonconformingSamples: p.nonconforming,
      })),
      products,
      worstLots,
    };
  }
}
