import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import type { Knex, SqlEntityManager } from '@mikro-orm/knex';
import type { ScorecardRange } from './scorecard-range';
import type { HistogramBin, ProductSeverity, WorstLot } from '@gaugeproof/api-types';
import { dateParam, num, numOrNull, sizesShort } from './scorecard-sql';

/**
 * Histogram edges of the area ratio: 2.5 % wide from 30 % to 110 % (our choice: fine
 * enough to show the 98 % line of ASTM B496 between two bins, wide enough to fill), with
 * an open bin below 30 % and one at 110 % and above. Edges in hundredths to stay exact.
 */
export const HISTOGRAM_EDGES: readonly number[] = Array.from(
  { length: 33 },
  (_, i) => (300 + i * 25) / 1000,
);

/** How many worst lots the scorecard lists (our choice). */
export const WORST_LOTS = 10;

/** The per-supplier detail of a scorecard: distribution, products and worst lots. */
@Injectable()
export class SupplierDetailQuery {
  constructor(private readonly em: EntityManager) {}

  private get knex(): Knex {
    return (this.em as SqlEntityManager).getKnex();
  }

  private liveReadings(range: ScorecardRange, supplierId: number): Knex.QueryBuilder {
    const platform = this.em.getPlatform();
    return this.knex('readings as r')
      .join('samples as s', 's.id', 'r.sample_id')
      .join('lots as l', 'l.id', 's.lot_id')
      .where('r.voided', false)
      .andWhere('l.supplier_id', supplierId)
      .andWhere('l.received_at', '>=', dateParam(platform, range.start) as Knex.Value)
      .andWhere('l.received_at', '<', dateParam(platform, range.end) as Knex.Value);
  }

  /** Counts of non-voided readings per area-ratio bin, one SUM(CASE) column per bin. */
  async histogram(range: ScorecardRange, supplierId: number): Promise<HistogramBin[]> {
    const k = this.knex;
    const edges = HISTOGRAM_EDGES;
    const bins: HistogramBin[] = [
      { from: null, to: edges[0], count: 0 },
      ...edges.slice(0, -1).map((e, i) => ({ from: e, to: edges[i + 1], count: 0 })),
      { from: edges[edges.length - 1], to: null, count: 0 },
    ];
    const q = this.liveReadings(range, supplierId);
    bins.forEach((bin, i) => {
      const conds: string[] = [];
      const bindings: Knex.Value[] = [];
      if (bin.from !== null) {
        conds.push('r.area_ratio >= ?');
        bindings.push(bin.from);
      }
      if (bin.to !== null) {
        conds.push('r.area_ratio < ?');
        bindings.push(bin.to);
      }
      q.select(k.raw(`sum(case when ${conds.join(' and ')} then 1 else 0 end) as b${i}`, bindings));
    });
    const [row] = (await q) as Record<string, unknown>[];
    return bins.map((bin, i) => ({ ...bin, count: num(row?.[`b${i}`]) }));
  }

  /**
   * The lots with the lowest non-voided area ratio, lowest first; for each, the label and
   * measures-as of its lowest reading and its largest shortfall in sizes.
   */
  async worstLots(range: ScorecardRange, supplierId: number): Promise<WorstLot[]> {
    const k = this.knex;
    const short = sizesShort('cs.gauge_label', 'r.measures_as', 'cs.gauge_system');
    const rows: Record<string, unknown>[] = await this.liveReadings(range, supplierId)
      .join('conductor_specs as cs', 'cs.id', 's.conductor_id')
      .join('products as p', 'p.id', 'l.product_id')
      .select('l.id as lot_id', 'l.po_number', 'l.received_at', 'l.status', 'p.sku')
      .select(k.raw('min(r.area_ratio) as lowest'))
      .select(k.raw(`max(${short.sql}) as sizes_short`, short.bindings as Knex.Value[]))
      .groupBy('l.id', 'l.po_number', 'l.received_at', 'l.status', 'p.sku')
      .orderBy([
        { column: 'lowest', order: 'asc' },
        { column: 'l.id', order: 'asc' },
      ])
      .limit(WORST_LOTS);
    if (rows.length === 0) return [];
    const labels = await this.lowestReadingLabels(rows.map((r) => num(r.lot_id)));
    return rows.map((r) => {
      const lotId = num(r.lot_id);
      const found = labels.get(lotId);
      return {
        lotId,
        poNumber: String(r.po_number),
        receivedAt: toIso(r.received_at),
        status: String(r.status),
        sku: String(r.sku),
        label: found?.label ?? null,
        measuresAs: found?.measuresAs ?? null,
        lowestAreaRatio: num(r.lowest),
        sizesShort: numOrNull(r.sizes_short),
      };
    });
  }

  /** Label and measures-as of each lot's lowest non-voided reading (first by id on ties). */
  private async lowestReadingLabels(
    lotIds: number[],
  ): Promise<Map<number, { label: string; measuresAs: string }>> {
    const k = this.knex;
    const lowest = k('readings as r2')
      .join('samples as s2', 's2.id', 'r2.sample_id')
      .where('r2.voided', false)
      .andWhere('s2.lot_id', k.ref('s.lot_id'))
      .min('r2.area_ratio');
    const rows: Record<string, unknown>[] = await k('readings as r')
      .join('samples as s', 's.id', 'r.sample_id')
      .join('conductor_specs as cs', 'cs.id', 's.conductor_id')
      .select('s.lot_id', 'cs.gauge_label', 'r.measures_as')
      .whereIn('s.lot_id', lotIds)
      .andWhere('r.voided', false)
      .andWhere('r.area_ratio', '=', lowest)
      .orderBy('r.id', 'asc');
    const out = new Map<number, { label: string; measuresAs: string }>();
    for (const r of rows) {
      const lotId = num(r.lot_id);
      if (!out.has(lotId)) {
        out.set(lotId, { label: String(r.gauge_label), measuresAs: String(r.measures_as) });
      }
    }
    return out;
  }

  /** Every product of the supplier with its current ISO 2859-1 switching state. */
  async products(supplierId: number): Promise<ProductSeverity[]> {
    const rows: Record<string, unknown>[] = await this.knex('products as p')
      .leftJoin('inspection_states as st', 'st.product_id', 'p.id')
      .select(
        'p.id',
        'p.sku',
        'p.description',
        'p.active',
        'p.min_area_ratio',
        'st.severity',
        'st.reason',
      )
      .where('p.supplier_id', supplierId)
      .orderBy('p.sku', 'asc');
    return rows.map((r) => ({
      productId: num(r.id),
      sku: String(r.sku),
      description: String(r.description),
      active: Boolean(r.active),
      minAreaRatio: num(r.min_area_ratio),
      severity: (r.severity ?? 'normal') as ProductSeverity['severity'],
      reason: r.reason === null || r.reason === undefined ? null : String(r.reason),
    }));
  }
}

/** A datetime column read raw: epoch ms on SQLite, a Date (or string) on PostgreSQL. */
function toIso(value: unknown): string {
  if (value instanceof Date) return value.toISOString();
  const n = Number(value);
  return new Date(Number.isFinite(n) ? n : String(value)).toISOString();
}
