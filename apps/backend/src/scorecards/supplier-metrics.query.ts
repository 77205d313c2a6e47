import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import type { Knex, SqlEntityManager } from '@mikro-orm/knex';
import type { MoneyTotal } from '@gaugeproof/api-types';
import type { ScorecardRange } from './scorecard-range';
import { dateParam, millisBetween, monthIndex, num, numOrNull, sizesShort } from './scorecard-sql';

export interface LotMonthRow {
  supplierId: number;
  monthIdx: number;
  lots: number;
  accepted: number;
  concession: number;
  rejected: number;
}

export interface ReadingMonthRow {
  supplierId: number;
  monthIdx: number;
  /** mass, strands, resistance or diameter: area ratios are compared per method (issue 13). */
  method: string;
  readings: number;
  sumRatio: number;
  minRatio: number | null;
  worstSizesShort: number | null;
}

export interface SamplePurposeRow {
  supplierId: number;
  purpose: string;
  tested: number;
  nonconforming: number;
  mismatches: number;
}

/**
 * Units (one kit, one spool: a sample's `seq` in its lot) by supplier. A unit is tested when
 * any of its conductors has a live reading, nonconforming when any of its conductors is: a
 * kit with one short conductor is one nonconforming unit (issue 13 point 9; ISO 2859-1 3.1.7
 * counts nonconforming units, not nonconformities, for these plans).
 */
export interface UnitRow {
  supplierId: number;
  tested: number;
  nonconforming: number;
}

export interface CorrectiveActionRow {
  supplierId: number;
  open: number;
  overdue: number;
  meanResponseMs: number | null;
}

/**
 * The scorecard's SQL aggregates, one query per family, each grouped by supplier (and
 * month or conductor purpose), so the database does the counting however many readings
 * there are. Portable SQL through knex: CASE, SUM, MIN, MAX, AVG, COUNT and sub-queries.
 */
@Injectable()
export class SupplierMetricsQuery {
  constructor(private readonly em: EntityManager) {}

  private get knex(): Knex {
    return (this.em as SqlEntityManager).getKnex();
  }

  private get platform() {
    return this.em.getPlatform();
  }

  private inRange(qb: Knex.QueryBuilder, column: string, range: ScorecardRange) {
    return qb
      .where(column, '>=', dateParam(this.platform, range.start) as Knex.Value)
      .andWhere(column, '<', dateParam(this.platform, range.end) as Knex.Value);
  }

  /** Lots by supplier and month; `returned` counts as rejected (it was rejected first). */
  async lotsByMonth(range: ScorecardRange, supplierId?: number): Promise<LotMonthRow[]> {
    const k = this.knex;
    const month = monthIndex(this.platform, 'l.received_at', range.months);
    const inner = this.inRange(
      k('lots as l').select(
        'l.supplier_id',
        'l.status',
        k.raw(`${month.sql} as month_idx`, month.bindings as Knex.Value[]),
      ),
      'l.received_at',
      range,
    );
    if (supplierId !== undefined) inner.andWhere('l.supplier_id', supplierId);
    const rows: Record<string, unknown>[] = await k
      .from(inner.as('t'))
      .select('t.supplier_id', 't.month_idx')
      .select(k.raw('count(*) as lots'))
      .select(k.raw('sum(case when t.status = ? then 1 else 0 end) as accepted', ['accepted']))
      .select(
        k.raw('sum(case when t.status = ? then 1 else 0 end) as concession', [
          'accepted_on_concession',
        ]),
      )
      .select(
        k.raw('sum(case when t.status in (?, ?) then 1 else 0 end) as rejected', [
          'rejected',
          'returned',
        ]),
      )
      .groupBy('t.supplier_id', 't.month_idx');
    return rows.map((r) => ({
      supplierId: num(r.supplier_id),
      monthIdx: num(r.month_idx),
      lots: num(r.lots),
      accepted: num(r.accepted),
      concession: num(r.concession),
      rejected: num(r.rejected),
    }));
  }

  /** Non-voided readings of lots received in the range, by supplier and month. */
  async readingsByMonth(range: ScorecardRange, supplierId?: number): Promise<ReadingMonthRow[]> {
    const k = this.knex;
    const month = monthIndex(this.platform, 'l.received_at', range.months);
    const short = sizesShort('cs.gauge_label', 'r.measures_as', 'cs.gauge_system');
    const inner = this.inRange(
      k('readings as r')
        .join('samples as s', 's.id', 'r.sample_id')
        .join('lots as l', 'l.id', 's.lot_id')
        .join('conductor_specs as cs', 'cs.id', 's.conductor_id')
        .select('l.supplier_id', 'r.area_ratio', 'r.method')
        .select(k.raw(`${month.sql} as month_idx`, month.bindings as Knex.Value[]))
        .select(k.raw(`${short.sql} as sizes_short`, short.bindings as Knex.Value[]))
        .where('r.voided', false),
      'l.received_at',
      range,
    );
    if (supplierId !== undefined) inner.andWhere('l.supplier_id', supplierId);
    const rows: Record<string, unknown>[] = await k
      .from(inner.as('t'))
      .select('t.supplier_id', 't.month_idx', 't.method')
      .select(k.raw('count(*) as readings'))
      .select(k.raw('sum(t.area_ratio) as sum_ratio'))
      .select(k.raw('min(t.area_ratio) as min_ratio'))
      .select(k.raw('max(t.sizes_short) as worst_short'))
      .groupBy('t.supplier_id', 't.month_idx', 't.method');
    return rows.map((r) => ({
      supplierId: num(r.supplier_id),
      monthIdx: num(r.month_idx),
      method: String(r.method),
      readings: num(r.readings),
      sumRatio: num(r.sum_ratio),
      minRatio: numOrNull(r.min_ratio),
      worstSizesShort: numOrNull(r.worst_short),
    }));
  }

  /**
   * Per sample with a live reading of a lot received in the range: nonconforming (nc) when any
   * of its readings is, a material mismatch (mm) when any of them found another metal.
   */
  private perSample(range: ScorecardRange, supplierId?: number): Knex.QueryBuilder {
    const k = this.knex;
    // Per sample, only the readings of lots received in the range (the range applied
    // inside the sub-query, so readings of other years are never grouped).
    const perSample = this.inRange(
      k('readings as r')
        .join('samples as s0', 's0.id', 'r.sample_id')
        .join('lots as l0', 'l0.id', 's0.lot_id')
        .select('r.sample_id')
        .select(k.raw('max(case when r.verdict = ? then 1 else 0 end) as nc', ['nonconforming']))
        .select(k.raw('max(case when r.material_mismatch = ? then 1 else 0 end) as mm', [true]))
        .where('r.voided', false)
        .groupBy('r.sample_id'),
      'l0.received_at',
      range,
    );
    if (supplierId !== undefined) perSample.andWhere('l0.supplier_id', supplierId);
    return perSample;
  }

  /** Units tested and nonconforming by supplier (UnitRow). */
  async units(range: ScorecardRange, supplierId?: number): Promise<UnitRow[]> {
    const k = this.knex;
    const perUnit = k
      .from(this.perSample(range, supplierId).as('ps'))
      .join('samples as s', 's.id', 'ps.sample_id')
      .join('lots as l', 'l.id', 's.lot_id')
      .select('l.supplier_id', 's.lot_id', 's.seq')
      .select(k.raw('max(ps.nc) as nc'))
      .groupBy('l.supplier_id', 's.lot_id', 's.seq');
    const rows: Record<string, unknown>[] = await k
      .from(perUnit.as('u'))
      .select('u.supplier_id')
      .select(k.raw('count(*) as tested'))
      .select(k.raw('sum(u.nc) as nonconforming'))
      .groupBy('u.supplier_id');
    return rows.map((r) => ({
      supplierId: num(r.supplier_id),
      tested: num(r.tested),
      nonconforming: num(r.nonconforming),
    }));
  }

  /**
   * Tested samples by supplier and conductor purpose. A sample (one cut piece for one
   * conductor) is tested with at least one non-voided reading, nonconforming when any of
   * those is (the rule of inspection/lot-evaluation.ts sampleVerdict), a material mismatch
   * when any of them found the material the label did not claim.
   */
  async samplesByPurpose(range: ScorecardRange, supplierId?: number): Promise<SamplePurposeRow[]> {
    const k = this.knex;
    const perSample = this.perSample(range, supplierId);
    const q = k
      .from(perSample.as('ps'))
      .join('samples as s', 's.id', 'ps.sample_id')
      .join('lots as l', 'l.id', 's.lot_id')
      .join('conductor_specs as cs', 'cs.id', 's.conductor_id')
      .select('l.supplier_id', 'cs.purpose')
      .select(k.raw('count(*) as tested'))
      .select(k.raw('sum(ps.nc) as nonconforming'))
      .select(k.raw('sum(ps.mm) as mismatches'))
      .groupBy('l.supplier_id', 'cs.purpose');
    const rows: Record<string, unknown>[] = await q;
    return rows.map((r) => ({
      supplierId: num(r.supplier_id),
      purpose: String(r.purpose),
      tested: num(r.tested),
      nonconforming: num(r.nonconforming),
      mismatches: num(r.mismatches),
    }));
  }

  /**
   * Corrective actions as they stand today: open = not closed; overdue = still awaiting
   * the supplier (open or reopened) with dueOn before today. Mean response time over the
   * requests raised in the range that have a response.
   */
  async correctiveActions(
    range: ScorecardRange,
    today: string,
    supplierId?: number,
  ): Promise<CorrectiveActionRow[]> {
    const k = this.knex;
    const start = dateParam(this.platform, range.start) as Knex.Value;
    const end = dateParam(this.platform, range.end) as Knex.Value;
    const q = k('corrective_actions as ca')
      .select('ca.supplier_id')
      .select(k.raw('sum(case when ca.status <> ? then 1 else 0 end) as open_count', ['closed']))
      .select(
        k.raw('sum(case when ca.status in (?, ?) and ca.due_on < ? then 1 else 0 end) as overdue', [
          'open',
          'reopened',
          today,
        ]),
      )
      .select(
        k.raw(
          `avg(case when ca.responded_at is not null and ca.created_at >= ? and ca.created_at < ? then ${millisBetween(this.platform, 'ca.created_at', 'ca.responded_at')} else null end) as mean_ms`,
          [start, end],
        ),
      )
      .groupBy('ca.supplier_id');
    if (supplierId !== undefined) q.where('ca.supplier_id', supplierId);
    const rows: Record<string, unknown>[] = await q;
    return rows.map((r) => ({
      supplierId: num(r.supplier_id),
      open: num(r.open_count),
      overdue: num(r.overdue),
      meanResponseMs: numOrNull(r.mean_ms),
    }));
  }

  /**
   * Chargebacks of the returns raised (created) in the range, by supplier and ISO 4217
   * currency: amounts in different currencies are never added together (nor converted).
   */
  async chargebacks(
    range: ScorecardRange,
    supplierId?: number,
  ): Promise<Map<number, MoneyTotal[]>> {
    const k = this.knex;
    const q = this.inRange(
      k('vendor_returns as vr')
        .select('vr.supplier_id', 'vr.currency')
        .select(k.raw('sum(vr.chargeback_total) as total'))
        .whereNot('vr.status', 'cancelled')
        .groupBy('vr.supplier_id', 'vr.currency')
        .orderBy('vr.currency'),
      'vr.created_at',
      range,
    );
    if (supplierId !== undefined) q.andWhere('vr.supplier_id', supplierId);
    const rows: Record<string, unknown>[] = await q;
    const bySupplier = new Map<number, MoneyTotal[]>();
    for (const r of rows) {
      const id = num(r.supplier_id);
      const totals = bySupplier.get(id) ?? [];
      // Each return's total is to the cent; their float sum is put back on the cent.
      totals.push({ currency: String(r.currency), amount: Math.round(num(r.total) * 100) / 100 });
      bySupplier.set(id, totals);
    }
    return bySupplier;
  }
}
