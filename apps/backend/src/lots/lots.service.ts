import {
  BadRequestException,
  Injectable,
  Optional,
  UnprocessableEntityException,
} from '@nestjs/common';
import { EntityManager, raw } from '@mikro-orm/core';
import type { QueryBuilder, SqlEntityManager } from '@mikro-orm/knex';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { addDays } from '../common/calendar';
import { likePattern, paging, parseSort, type Page } from '../common/paging';
import { InspectionState } from '../products/entities/inspection-state.entity';
import { Product } from '../products/entities/product.entity';
import { planForLot } from '../products/sampling-plan';
import { User } from '../users/entities/user.entity';
import { CreateLotDto } from './dto/create-lot.dto';
import { LotFiltersDto } from './dto/list-lots.dto';
import { Lot } from './entities/lot.entity';
import { LotListCache } from './lot-list-cache';
import {
  LIST_COLUMNS,
  lotSummary,
  summaryOfRow,
  supplierWarning,
  type LotSummary,
} from './lot-summary';
import { lotCsvRow } from './lots-csv';
import type { CsvRow } from '../common/csv';
import { jsonAnswer, type JsonAnswer } from '../common/json-answer';

const SORTS = ['receivedAt', 'poNumber', 'status', 'supplier', 'quantity'] as const;
const SORT_COLUMNS: Record<(typeof SORTS)[number], string> = {
  receivedAt: 'l.receivedAt',
  poNumber: 'l.poNumber',
  status: 'l.status',
  supplier: 's.name',
  quantity: 'l.quantity',
};
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
    /** Optional so scripts that build the service by hand (the demo seed) count directly. */
    @Optional() private readonly cache?: LotListCache,
  ) {}

  async create(dto: CreateLotDto, actor: RequestUser) {
    const product = await this.em.findOne(
      Product,
      { id: dto.productId },
      { populate: ['supplier'] },
    );
    if (!product) throw new BadRequestException(['productId must be the id of a product']);
    if (!product.active) {
      throw new UnprocessableEntityException(
        `${product.sku} of ${product.supplier.name} is no longer an active product; reactivate it or receive the delivery against the right product.`,
      );
    }
    const state = await this.em.findOne(InspectionState, { product });
    const plan = planForLot(product, state, dto.quantity);
    if (!plan.samplingPlan) throw new UnprocessableEntityException(plan.message);
    const samplingPlan = plan.samplingPlan;
    return this.em.transactional(async (em) => {
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
        after: { ...summary, notes: lot.notes },
      });
      return { ...summary, notes: lot.notes, supplierWarning: supplierWarning(product.supplier) };
    });
  }

  /**
   * A page of the lot list as its JSON answer; the same query is answered from
   * LotListCache until a write could change it.
   */
  async listAnswer(q: LotFiltersDto): Promise<JsonAnswer> {
    if (!this.cache) return jsonAnswer(await this.list(q));
    return this.cache.page(JSON.stringify(q), async () => jsonAnswer(await this.list(q)));
  }

  /** A page of the lot list, read from the database. */
  async list(q: LotFiltersDto): Promise<Page<LotSummary>> {
    const { page, pageSize, offset } = paging(q);
    const qb = this.filtered(q, await this.walkInReceivedOrder(q));
    const { page: _p, pageSize: _s, sort: _o, ...filters } = q;
    const count = () => qb.clone().getCount('l.id');
    const total = this.cache
      ? await this.cache.total(JSON.stringify(filters), count)
      : await count();
    const items = await this.summaries(qb, q, pageSize, offset);
    return { items, total, page, pageSize };
  }

  /**
   * A page of LotSummary read as plain rows: no entities to hydrate, merge and populate
   * (most of a list request's cost once the SQL is cheap).
   */
  private async summaries(
    qb: QueryBuilder<Lot>,
    q: LotFiltersDto,
    limit: number,
    offset: number,
  ): Promise<LotSummary[]> {
    const rows = await this.sorted(qb.clone(), q)
      .select(LIST_COLUMNS.map((c) => raw(c)))
      .join('l.receivedBy', 'u')
      .limit(limit)
      .offset(offset)
      .execute<Record<string, unknown>[]>('all', false);
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
    parseSort(q.sort, SORTS, ['receivedAt', 'desc']);
    // Its own EntityManager: the pages are read after the handler has returned, while the
    // response streams, outside the request's context.
    const em = this.em.fork();
    const qb = this.filtered(q, await this.walkInReceivedOrder(q), em);
    const total = await qb.clone().getCount('l.id');
    if (total > LOT_EXPORT_MAX_ROWS) {
      throw new UnprocessableEntityException(
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
    return this.exportPages(qb, q, total);
  }

  private async *exportPages(
    qb: QueryBuilder<Lot>,
    q: LotFiltersDto,
    total: number,
  ): AsyncGenerator<CsvRow[]> {
    for (let offset = 0; offset < total; offset += EXPORT_PAGE_SIZE) {
      const page = await this.summaries(qb, q, EXPORT_PAGE_SIZE, offset);
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
  private async walkInReceivedOrder(q: LotFiltersDto): Promise<boolean> {
    if (!this.cache || !q.status?.length) return false;
    if (parseSort(q.sort, SORTS, ['receivedAt', 'desc'])[0] !== 'receivedAt') return false;
    const count = (filters: LotFiltersDto) => () => this.filtered(filters).getCount('l.id');
    const all = await this.cache.total(JSON.stringify({}), count({}));
    const some = await this.cache.total(
      JSON.stringify({ status: q.status }),
      count({ status: q.status }),
    );
    return all > 0 && some / all >= WALK_SHARE;
  }

  /**
   * The filters as SQL. `walkByDate`: the status test is written so no index can serve it
   * (`coalesce` of a NOT NULL column, the same rows on every database), see
   * walkInReceivedOrder. `em`: the manager the query is built on.
   */
  private filtered(q: LotFiltersDto, walkByDate = false, em = this.em): QueryBuilder<Lot> {
    if (q.receivedFrom && q.receivedTo && q.receivedTo < q.receivedFrom) {
      throw new BadRequestException(['receivedTo must not be before receivedFrom']);
    }
    const qb = (em as SqlEntityManager)
      .createQueryBuilder(Lot, 'l')
      .select('l.*')
      .join('l.product', 'p')
      .join('l.supplier', 's');
    if (q.status?.length && walkByDate) {
      qb.andWhere(`coalesce(l.status, '') in (${q.status.map(() => '?').join(', ')})`, q.status);
    } else if (q.status?.length) {
      qb.andWhere({ status: { $in: q.status } });
    }
    if (q.supplierId) qb.andWhere({ supplier: q.supplierId });
    if (q.productId) qb.andWhere({ product: q.productId });
    if (q.receivedFrom) {
      qb.andWhere({ receivedAt: { $gte: new Date(`${q.receivedFrom}T00:00:00Z`) } });
    }
    if (q.receivedTo) {
      qb.andWhere({ receivedAt: { $lt: new Date(`${addDays(q.receivedTo, 1)}T00:00:00Z`) } });
    }
    if (q.q?.trim()) {
      // Names and SKUs match anywhere and are looked up once in their small tables; PO,
      // packing slip and supplier lot code match by their start, as a clerk types them.
      const any = likePattern(q.q);
      const start = any.slice(1);
      const like = (col: string) => `lower(${col}) like ? escape '\\'`;
      qb.andWhere(
        `(${[
          `l.supplier_id in (select id from suppliers where ${like('name')})`,
          `l.product_id in (select id from products where ${like('sku')})`,
          like('l.po_number'),
          like('l.packing_slip'),
          like('l.supplier_lot_code'),
        ].join(' or ')})`,
        [any, any, start, start, start],
      );
    }
    return qb;
  }

  private sorted(qb: QueryBuilder<Lot>, q: LotFiltersDto): QueryBuilder<Lot> {
    const [field, dir] = parseSort(q.sort, SORTS, ['receivedAt', 'desc']);
    return qb.orderBy({ [SORT_COLUMNS[field]]: dir, 'l.id': dir });
  }
}
