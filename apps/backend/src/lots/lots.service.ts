import { DomainError } from '../common/domain-error';
import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { paging, type Page } from '../common/paging';
import { plainSql } from '../common/plain-sql';
import { InspectionState } from '../products/entities/inspection-state.entity';
import { Product } from '../products/entities/product.entity';
import { planForLot } from '../products/sampling-plan';
import { User } from '../users/entities/user.entity';
import { alreadyReceivedError, lotsReceivedAs } from './already-received';
import { CreateLotDto } from './dto/create-lot.dto';
import { LotFiltersDto } from './dto/list-lots.dto';
import { Lot } from './entities/lot.entity';
import { LotListCache } from './lot-list-cache';
import { ChangeCounters, type Counters } from '../common/change-counters';
import {
  lotCountSql,
  lotFilterSql,
  lotPageSql,
  lotSort,
  type LotFilterSql,
  type LotSort,
} from './lot-list-sql';
import { lotSummary, summaryOfRow, supplierWarning, type LotSummary } from './lot-summary';
import { lotCsvRow } from './lots-csv';
import type { CsvRow } from '../common/csv';
import { jsonAnswer, type JsonAnswer } from '../common/json-answer';

/**
 * Share of all lots above which a status filter walks the received-at index instead of
 * the status index (our choice, from EXPLAIN QUERY PLAN on the bench set: a quarter of
 * the lots still fills a page of 50 within a few hundred index steps).
 */
const WALK_SHARE = 0.25;
/** Lots per page of the CSV export (our choice: small enough to keep memory flat). */
const EXPORT_PAGE_SIZE = 1000;
/** An export is for a spreadsheet; beyond this, narrow the filters (common practice, no source). */
export const LOT_EXPORT_MAX_ROWS = 50_000;

const blankToNull = (v: string | null | undefined) => (v?.trim() ? v.trim() : null);

@Injectable()
export class LotsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly cache: LotListCache,
    private readonly changes: ChangeCounters,
  ) {}

  async create(dto: CreateLotDto, actor: RequestUser) {
    const product = await this.em.findOne(
      Product,
      { id: dto.productId },
      { populate: ['supplier'] },
    );
    if (!product)
      throw DomainError.invalid([
        { field: 'productId', message: 'productId must be the id of a product' },
      ]);
    if (!product.active) {
      throw DomainError.refused(
        `${product.sku} of ${product.supplier.name} is no longer an active product; reactivate it or receive the delivery against the right product.`,
        'productId',
      );
    }
    const state = await this.em.findOne(InspectionState, { product });
    const plan = planForLot(product, state, dto.quantity);
    if (!plan.samplingPlan) throw DomainError.refused(plan.message);
    const samplingPlan = plan.samplingPlan;
    return this.em.transactional(async (em) => {
      // Inside the write transaction: on SQLite two receipts of one slip at once queue here.
      const earlier = await lotsReceivedAs(em, dto.poNumber, dto.packingSlip);
      if (earlier.length > 0 && dto.receiveAgain !== true) {
        throw alreadyReceivedError(dto.poNumber, dto.packingSlip ?? '', earlier);
      }
      const lot = em.create(Lot, {
        product,
        supplier: product.supplier,
        poNumber: dto.poNumber.trim(),
        packingSlip: blankToNull(dto.packingSlip),
        supplierLotCode: blankToNull(dto.supplierLotCode),
        quantity: dto.quantity,
        unit: dto.unit.trim(),
        receivedBy: await em.findOneOrFail(User, { id: actor.id }),
        status: 'on_hold',
        samplingPlan,
        notes: blankToNull(dto.notes),
        version: 1,
      });
      await em.flush();
      const summary = lotSummary(lot);
      this.audit.record(em, actor, {
        action: 'lot.create',
        entityType: 'lot',
        entityId: lot.id,
        lotId: lot.id,
        after: {
          ...summary,
          notes: lot.notes,
          // A confirmed second receipt of a slip names the lots it repeats.
          ...(earlier.length > 0 ? { receivedAgainOf: earlier.map((l) => l.id) } : {}),
        },
      });
      return { ...summary, notes: lot.notes, supplierWarning: supplierWarning(product.supplier) };
    });
  }

  /** The lots already received under this PO and packing slip, oldest first. */
  async receivedBefore(poNumber: string, packingSlip: string) {
    return { lots: await lotsReceivedAs(this.em, poNumber, packingSlip) };
  }

  /**
   * A page of the lot list as its JSON answer; the same query is answered from
   * LotListCache until the database's change counters show a write it reads from.
   */
  async listAnswer(q: LotFiltersDto): Promise<JsonAnswer> {
    const counters = await this.changes.read();
    return this.cache.page(counters, JSON.stringify(q), async () =>
      jsonAnswer(await this.list(q, counters)),
    );
  }

  /** A page of the lot list, read from the database (its totals kept under `counters`). */
  private async list(q: LotFiltersDto, counters: Counters): Promise<Page<LotSummary>> {
    const { page, pageSize, offset } = paging(q);
    const sort = lotSort(q);
    const filter = lotFilterSql(q, await this.walkInReceivedOrder(q, sort, counters));
    const { page: _p, pageSize: _s, sort: _o, ...filters } = q;
    const total = await this.cache.total(counters, JSON.stringify(filters), () =>
      this.count(this.em, filter),
    );
    const items = await this.summaries(this.em, filter, sort, pageSize, offset);
    return { items, total, page, pageSize };
  }

  private async count(em: EntityManager, filter: LotFilterSql): Promise<number> {
    const { sql, bindings } = lotCountSql(filter);
    const [row] = await plainSql<{ n: unknown }[]>(em, sql, bindings);
    return Number(row.n);
  }

  /**
   * A page of LotSummary read as plain rows: no entities to hydrate, merge and populate
   * (most of a list request's cost once the SQL is cheap).
   */
  private async summaries(
    em: EntityManager,
    filter: LotFilterSql,
    sort: [LotSort, 'asc' | 'desc'],
    limit: number,
    offset: number,
  ): Promise<LotSummary[]> {
    const { sql, bindings } = lotPageSql(filter, sort, limit, offset);
    const rows = await plainSql(em, sql, bindings);
    return rows.map(summaryOfRow);
  }

  /**
   * The list's CSV rows with the same filters and sort, in pages of EXPORT_PAGE_SIZE, so a
   * distributor's 50 000 lots stream instead of sitting in memory (they took 280 MB as
   * entities). Refused with 422 above LOT_EXPORT_MAX_ROWS; the export is audited before
   * its first row. Pages are by offset: a lot received while the file downloads can shift
   * a row between two pages.
   */
  async exportRows(q: LotFiltersDto, actor: RequestUser): Promise<AsyncGenerator<CsvRow[]>> {
    // Checked before anything: a bad sort found while streaming cut the file after a 200
    // (and the export was audited as done).
    const sort = lotSort(q);
    // Its own EntityManager: the pages are read after the handler has returned, while the
    // response streams, outside the request's context.
    const em = this.em.fork();
    const filter = lotFilterSql(
      q,
      await this.walkInReceivedOrder(q, sort, await this.changes.read()),
    );
    const total = await this.count(em, filter);
    if (total > LOT_EXPORT_MAX_ROWS) {
      throw DomainError.refused(
        `${total} lots match; narrow the filters to at most ${LOT_EXPORT_MAX_ROWS} for one export.`,
      );
    }
    const { page: _p, pageSize: _s, ...filters } = q;
    this.audit.record(em, actor, {
      action: 'lot.export',
      entityType: 'lot',
      after: { filters: { ...filters }, rows: total },
    });
    await em.flush();
    return this.exportPages(em, filter, sort, total);
  }

  private async *exportPages(
    em: EntityManager,
    filter: LotFilterSql,
    sort: [LotSort, 'asc' | 'desc'],
    total: number,
  ): AsyncGenerator<CsvRow[]> {
    for (let offset = 0; offset < total; offset += EXPORT_PAGE_SIZE) {
      const page = await this.summaries(em, filter, sort, EXPORT_PAGE_SIZE, offset);
      if (page.length === 0) return;
      yield page.map(lotCsvRow);
    }
  }

  /**
   * Whether the page should walk the received-at index and stop after its rows, rather than
   * take the lots of the chosen statuses from the (status, received at) index and sort them
   * all. Walking wins when the statuses hold a large share of the lots (the decided ones:
   * most of a distributor's years), the status index when they are few (the open lots of
   * the Today screen). SQLite's planner cannot tell the two apart once a text filter is
   * added, and chose the sort over 45 000 decided lots (60 ms a page on the bench set).
   * Shares come from the cached totals, so this costs nothing between lot writes.
   */
  private async walkInReceivedOrder(
    q: LotFiltersDto,
    [field]: [LotSort, 'asc' | 'desc'],
    counters: Counters,
  ): Promise<boolean> {
    if (!q.status?.length || field !== 'receivedAt') return false;
    const count = (filters: LotFiltersDto) => () => this.count(this.em, lotFilterSql(filters));
    const all = await this.cache.total(counters, JSON.stringify({}), count({}));
    const some = await this.cache.total(
      counters,
      JSON.stringify({ status: q.status }),
      count({ status: q.status }),
    );
    return all > 0 && some / all >= WALK_SHARE;
  }
}
