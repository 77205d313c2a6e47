import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import type { Knex, SqlEntityManager } from '@mikro-orm/knex';
import { plainSql } from '../common/plain-sql';
import { instantOf, jsonOf } from '../common/sql-values';

/** Readings per page of the export (our choice: small enough to keep memory flat). */
export const EXPORT_PAGE_SIZE = 1000;

export interface ExportedReading {
  id: number;
  lotId: number;
  poNumber: string;
  supplierLotCode: string | null;
  packingSlip: string | null;
  /** The lot's return to vendor: the exported return, or its newest one not cancelled. */
  rtvNumber: string | null;
  rmaNumber: string | null;
  /** The lot's newest nonconformance report. */
  ncrNumber: string | null;
  supplier: string;
  sku: string;
  receivedAt: Date;
  seq: number;
  unitRef: string | null;
  purpose: string;
  gaugeLabel: string;
  method: string;
  inputs: Record<string, number | number[]>;
  /** "name (serial)" of each instrument used, as snapshotted with the reading. */
  instruments: string;
  fourWire: boolean | null;
  confirmedUnusual: boolean;
  areaMm2: number;
  uMm2: number;
  expandedUMm2: number;
  areaRatio: number;
  measuresAs: string;
  identifiedMaterial: string | null;
  verdict: string;
  takenAt: Date;
  voided: boolean;
  voidReason: string | null;
}

export interface ExportRange {
  /** Inclusive start instant of the lots' received date, or null for no lower bound. */
  start: Date | null;
  /** Exclusive end instant, or null. */
  end: Date | null;
}

type Row = Record<string, unknown>;

/** A boolean column as either driver gives it (0/1 on SQLite, true/false on PostgreSQL). */
const flag = (v: unknown): boolean => v === true || Number(v) === 1;

/** "Bench balance (BAL-7); Steel rule (RUL-2)" from a reading's instrument snapshots. */
export function instrumentsText(value: unknown): string {
  const list = jsonOf<{ name?: string; serial?: string }[] | null>(value) ?? [];
  return list.map((i) => `${i.name ?? ''} (${i.serial ?? ''})`).join('; ');
}

/** Whose readings: one supplier's lots received in a range, or the lots on one return. */
export type ExportScope = { supplierId: number; range: ExportRange } | { returnId: number };

/** Where the previous page ended: the last lot and reading written. */
export interface ExportCursor {
  lotId: number;
  readingId: number;
}

/**
 * The readings of a scope in pages, in lot order then reading id, keyset on (lot id,
 * reading id). Each page first takes the next ids through the indexes only (lots by
 * supplier, or by return, in id order; samples by lot; readings by sample): a page costs
 * the same at the end of the file as at its start, and the wide reading rows of other
 * lots are never touched. Then it reads those rows.
 */
@Injectable()
export class ReadingsExportQuery {
  constructor(private readonly em: EntityManager) {}

  private get knex(): Knex {
    return (this.em as SqlEntityManager).getKnex();
  }

  private date(d: Date): Knex.Value {
    return this.em.getPlatform().processDateProperty(d) as Knex.Value;
  }

  /**
   * The return and NCR numbers of a page's lots, one query each: the exported return (or
   * each lot's newest return not cancelled) and each lot's newest nonconformance report.
   */
  private async lotPapers(scope: ExportScope, lotIds: number[]) {
    const k = this.knex;
    const q = k('vendor_return_lots as vrl')
      .join('vendor_returns as vr', 'vr.id', 'vrl.vendor_return_id')
      .whereIn('vrl.lot_id', lotIds)
      .select('vrl.lot_id', 'vr.number', 'vr.rma_number')
      .orderBy('vr.id');
    if ('returnId' in scope) q.andWhere('vr.id', scope.returnId);
    else q.andWhereNot('vr.status', 'cancelled');
    const returns = new Map<number, { number: string; rma: string | null }>();
    for (const r of (await q) as Row[]) {
      returns.set(Number(r.lot_id), {
        number: String(r.number),
        rma: (r.rma_number as string | null) ?? null,
      });
    }
    const ncrs = new Map<number, string>();
    for (const n of (await k('nonconformances')
      .whereIn('lot_id', lotIds)
      .select('lot_id', 'number')
      .orderBy('id')) as Row[]) {
      ncrs.set(Number(n.lot_id), String(n.number));
    }
    return { returns, ncrs };
  }

  async page(scope: ExportScope, after: ExportCursor): Promise<ExportedReading[]> {
    const k = this.knex;
    // The page's reading ids through the indexes only (the subquery), then those readings
    // with their sample and conductor, in one statement of fixed text with its values
    // bound: it was two, the ids brought back and sent again as a thousand values, the
    // second statement built by the query builder on every page (a third of the return
    // export's time on the 50 000-lot bench set, --cpu-prof). The lot's own columns (PO,
    // supplier, SKU, received) are read once per lot below, not repeated on each of its
    // readings (a quarter of the page's SQL time on the bench set).
    const scoped: string[] = [];
    const values: unknown[] = [];
    let returnJoin = '';
    if ('returnId' in scope) {
      returnJoin = 'join vendor_return_lots vrl on vrl.lot_id = pl.id';
      scoped.push('vrl.vendor_return_id = ?');
      values.push(scope.returnId);
    } else {
      scoped.push('pl.supplier_id = ?');
      values.push(scope.supplierId);
      const { start, end } = scope.range;
      if (start) {
        scoped.push('pl.received_at >= ?');
        values.push(this.date(start));
      }
      if (end) {
        scoped.push('pl.received_at < ?');
        values.push(this.date(end));
      }
    }
    const rows = await plainSql<Row[]>(
      this.em,
      `select r.id, s.lot_id, s.seq, s.unit_ref, cs.purpose, cs.gauge_label, r.method,
              r.inputs, r.instruments, r.four_wire, r.confirmed_unusual, r.area_mm2, r.u_mm2,
              r.expanded_umm2, r.area_ratio, r.measures_as, r.identified_material, r.verdict,
              r.taken_at, r.voided, r.void_reason
         from readings r
         join samples s on s.id = r.sample_id
         join conductor_specs cs on cs.id = s.conductor_id
        where r.id in (
          select pr.id from lots pl
            join samples ps on ps.lot_id = pl.id
            join readings pr on pr.sample_id = ps.id
            ${returnJoin}
           where ${scoped.join(' and ')} and pl.id >= ? and (pl.id > ? or pr.id > ?)
           order by pl.id, pr.id
           limit ?)
        order by s.lot_id, r.id`,
      [...values, after.lotId, after.lotId, after.readingId, EXPORT_PAGE_SIZE],
    );
    if (rows.length === 0) return [];
    const lotIds = [...new Set(rows.map((r) => Number(r.lot_id)))];
    const lots = new Map<number, Row>();
    for (const l of (await k('lots as l')
      .join('products as p', 'p.id', 'l.product_id')
      .join('suppliers as su', 'su.id', 'l.supplier_id')
      .whereIn('l.id', lotIds)
      .select(
        'l.id',
        'l.po_number',
        'l.supplier_lot_code',
        'l.packing_slip',
        'su.name as supplier_name',
        'p.sku',
        'l.received_at',
      )) as Row[]) {
      lots.set(Number(l.id), l);
    }
    const { returns, ncrs } = await this.lotPapers(scope, lotIds);
    return rows.map((r) => {
      const lot = lots.get(Number(r.lot_id))!;
      return {
        id: Number(r.id),
        lotId: Number(r.lot_id),
        poNumber: String(lot.po_number),
        supplierLotCode: (lot.supplier_lot_code as string | null) ?? null,
        packingSlip: (lot.packing_slip as string | null) ?? null,
        rtvNumber: returns.get(Number(r.lot_id))?.number ?? null,
        rmaNumber: returns.get(Number(r.lot_id))?.rma ?? null,
        ncrNumber: ncrs.get(Number(r.lot_id)) ?? null,
        supplier: String(lot.supplier_name),
        sku: String(lot.sku),
        receivedAt: instantOf(lot.received_at),
        seq: Number(r.seq),
        unitRef: (r.unit_ref as string | null) ?? null,
        purpose: String(r.purpose),
        gaugeLabel: String(r.gauge_label),
        method: String(r.method),
        inputs: jsonOf<Record<string, number | number[]>>(r.inputs),
        instruments: instrumentsText(r.instruments),
        fourWire: r.four_wire === null || r.four_wire === undefined ? null : flag(r.four_wire),
        confirmedUnusual: flag(r.confirmed_unusual),
        areaMm2: Number(r.area_mm2),
        uMm2: Number(r.u_mm2),
        expandedUMm2: Number(r.expanded_umm2),
        areaRatio: Number(r.area_ratio),
        measuresAs: String(r.measures_as),
        identifiedMaterial: (r.identified_material as string | null) ?? null,
        verdict: String(r.verdict),
        takenAt: instantOf(r.taken_at),
        voided: flag(r.voided),
        voidReason: (r.void_reason as string | null) ?? null,
      };
    });
  }
}
