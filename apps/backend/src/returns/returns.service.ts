import { DomainError } from '../common/domain-error';
import { Inject, Injectable } from '@nestjs/common';
import type { SqlEntityManager } from '@mikro-orm/knex';
import { EntityManager, OptimisticLockError, type FilterQuery } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { isCalendarDate } from '../common/calendar';
import { formatNumber, nextSeqInYear, retryOnUniqueConflict } from '../common/numbering';
import { paging, parseSort, type Page } from '../common/paging';
import { plainSql } from '../common/plain-sql';
import { APP_CONFIG } from '../config/config.module';
import { isCurrencyCode, type AppConfig } from '../config/env';
import { Decision } from '../decisions/entities/decision.entity';
import { Lot } from '../lots/entities/lot.entity';
import { User } from '../users/entities/user.entity';
import { CreateReturnDto } from './dto/create-return.dto';
import { ListReturnsDto } from './dto/list-returns.dto';
import type {
  AcknowledgeReturnDto,
  CancelReturnDto,
  CreditReturnDto,
  ReturnStepDto,
  ShipReturnDto,
} from './dto/return-steps.dto';
import { UpdateReturnDto } from './dto/update-return.dto';
import { OpenReturnLot } from './entities/open-return-lot.entity';
import { VendorReturn, type ReturnStatus } from './entities/vendor-return.entity';
import { allowedNext, canMove, chargeback, cleanCosts } from './return-rules';
import { returnTerms, returnView, type ReturnView } from './return-view';
import { clock } from '../common/clock';

const POPULATE = ['supplier', 'lots', 'createdBy'] as const;

/** What an export of a return records: its id, number and lots. */
export interface ReturnRef {
  id: number;
  number: string;
  lotIds: number[];
}

export const refOf = (r: VendorReturn): ReturnRef => ({
  id: r.id,
  number: r.number,
  lotIds: r.lots.getItems().map((l) => l.id),
});
const audited = (r: VendorReturn) => ({
  number: r.number,
  status: r.status,
  version: r.version,
  ...returnTerms(r),
  lotIds: r.lots.getItems().map((l) => l.id),
  carrier: r.carrier,
  trackingNumber: r.trackingNumber,
  shippedOn: r.shippedOn,
  shippedQuantity: r.shippedQuantity,
  creditNoteNumber: r.creditNoteNumber,
  creditAmount: r.creditAmount,
  cancelReason: r.cancelReason,
});

const STEP_WORDS: Record<string, string> = {
  draft: 'draft',
  emailed: 'notice e-mailed',
  shipped: 'shipped',
  acknowledged: 'acknowledged',
  credited: 'credited',
  closed: 'closed',
  cancelled: 'cancelled',
};

function checkCurrency(code: string): string {
  if (!isCurrencyCode(code)) {
    throw DomainError.refused(
      `currency ${code} is not an ISO 4217 code this server knows`,
      'currency',
    );
  }
  return code;
}

@Injectable()
export class ReturnsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    @Inject(APP_CONFIG) private readonly config: Pick<AppConfig, 'currency'>,
  ) {}

  create(dto: CreateReturnDto, actor: RequestUser): Promise<ReturnView> {
    const currency = checkCurrency(dto.currency ?? this.config.currency);
    return retryOnUniqueConflict(() =>
      this.em.transactional((tx) => this.createIn(tx, dto, currency, actor)),
    );
  }

  /**
   * The lots, checked: they exist, are rejected, come from one supplier and are on no other
   * open return. The last check is only a kind message: the `open_return_lots` key is what
   * holds under races (the loser's insert fails, its retry lands here and is told why).
   */
  private async returnableLots(tx: EntityManager, lotIds: number[], exceptReturn?: number) {
    const lots = await tx.find(Lot, { id: { $in: lotIds } }, { populate: ['supplier'] });
    const missing = lotIds.filter((id) => !lots.some((l) => l.id === id));
    if (missing.length)
      throw DomainError.refused(`There is no lot ${missing.join(', ')}`, 'lotIds');
    const notRejected = lots.filter((l) => l.status !== 'rejected');
    if (notRejected.length) {
      throw DomainError.refused(
        `Only rejected lots go back to the supplier: ${notRejected.map((l) => `lot ${l.id} is ${l.status.replace(/_/g, ' ')}`).join('; ')}`,
        'lotIds',
      );
    }
    const suppliers = new Set(lots.map((l) => l.supplier.id));
    if (suppliers.size > 1) {
      throw DomainError.refused(
        'A return goes to one supplier: choose lots of one supplier only',
        'lotIds',
      );
    }
    const claims = await tx.find(
      OpenReturnLot,
      { lot: { $in: lotIds }, ...(exceptReturn ? { vendorReturn: { $ne: exceptReturn } } : {}) },
      { populate: ['vendorReturn'] },
    );
    if (claims.length) {
      const byReturn = new Map<string, number[]>();
      for (const c of claims) {
        const list = byReturn.get(c.vendorReturn.number) ?? [];
        list.push(c.lot.id);
        byReturn.set(c.vendorReturn.number, list);
      }
      const taken = [...byReturn].map(([n, ids]) => `${n} (lots ${ids.join(', ')})`);
      throw DomainError.refused(
        `These lots are already on an open return: ${taken.join('; ')}`,
        'lotIds',
      );
    }
    return lots;
  }

  private async createIn(
    tx: EntityManager,
    dto: CreateReturnDto,
    currency: string,
    actor: RequestUser,
  ) {
    const lots = await this.returnableLots(tx, dto.lotIds);
    const year = clock.now().getUTCFullYear();
    const costs = cleanCosts(dto.costs);
    const ret = tx.create(VendorReturn, {
      number: formatNumber('RTV', year, await nextSeqInYear(tx, VendorReturn, 'RTV', year)),
      supplier: lots[0].supplier,
      rmaNumber: dto.rmaNumber?.trim() || null,
      notes: dto.notes?.trim() || null,
      supplierNote: dto.supplierNote?.trim() || null,
      costs,
      chargebackTotal: chargeback(costs),
      currency,
      createdBy: tx.getReference(User, actor.id),
    });
    ret.lots.set(lots);
    await tx.flush();
    for (const lot of lots) tx.create(OpenReturnLot, { lot, vendorReturn: ret });
    await tx.flush();
    for (const lot of lots) {
      this.audit.record(tx, actor, {
        action: 'return.create',
        entityType: 'vendor_return',
        entityId: ret.id,
        lotId: lot.id,
        after: audited(ret),
      });
    }
    await tx.populate(ret, POPULATE);
    return returnView(ret);
  }

  async get(id: number): Promise<ReturnView> {
    return returnView(await this.load(this.em, id));
  }

  /** Number and lot ids of a return, read without loading its lots (the CSV's needs). */
  async ref(id: number): Promise<ReturnRef> {
    const sql = this.em as SqlEntityManager;
    const [ret] = await plainSql<{ id: number; number: string }[]>(
      sql,
      'select id, number from vendor_returns where id = ?',
      [id],
    );
    if (!ret) throw DomainError.notFound(`There is no return ${id}`);
    const lots = await plainSql<{ lotId: number }[]>(
      sql,
      'select lot_id as "lotId" from vendor_return_lots where vendor_return_id = ? order by lot_id',
      [id],
    );
    return { id: ret.id, number: ret.number, lotIds: lots.map((l) => l.lotId) };
  }

  /** A return to build documents from, in a manager of its own. */
  loadForDocuments(id: number): Promise<VendorReturn> {
    return this.load(this.em.fork(), id);
  }

  async load(em: EntityManager, id: number): Promise<VendorReturn> {
    const ret = await em.findOne(VendorReturn, id, { populate: POPULATE });
    if (!ret) throw DomainError.notFound(`There is no return ${id}`);
    return ret;
  }

  private where(q: ListReturnsDto): FilterQuery<VendorReturn> {
    const where: FilterQuery<VendorReturn> = {};
    if (q.status) where.status = { $in: q.status.split(',') as ReturnStatus[] };
    if (q.supplierId) where.supplier = q.supplierId;
    return where;
  }

  /**
   * Purchasing's queue (Today): rejected lots on no open return (not even a draft), oldest
   * rejection first, with how long each has waited.
   */
  async unreturnedLots(limit = 100) {
    const em = this.em.fork();
    const rows = await plainSql<{ id: number }[]>(
      em,
      `select l.id from lots l where l.status = 'rejected'
         and not exists (select 1 from open_return_lots o where o.lot_id = l.id)
       order by l.received_at asc, l.id asc limit ?`,
      [limit + 1],
    );
    const ids = rows.slice(0, limit).map((r) => Number(r.id));
    const lots = await em.find(Lot, { id: { $in: ids } }, { populate: ['supplier', 'product'] });
    const rejections = await em.find(
      Decision,
      { lot: { $in: ids }, outcome: 'reject' },
      { orderBy: { decidedAt: 'asc' } },
    );
    const rejectedAt = new Map(rejections.map((d) => [d.lot.id, d.decidedAt]));
    const items = lots
      .map((l) => ({
        id: l.id,
        poNumber: l.poNumber,
        supplierLotCode: l.supplierLotCode,
        quantity: l.quantity,
        unit: l.unit,
        receivedAt: l.receivedAt,
        rejectedAt: rejectedAt.get(l.id) ?? null,
        supplier: { id: l.supplier.id, name: l.supplier.name },
        product: { id: l.product.id, sku: l.product.sku },
      }))
      .sort(
        (a, b) => (a.rejectedAt?.getTime() ?? 0) - (b.rejectedAt?.getTime() ?? 0) || a.id - b.id,
      );
    return { items, more: rows.length > limit };
  }

  async list(q: ListReturnsDto): Promise<Page<ReturnView>> {
    const { page, pageSize, offset } = paging(q);
    const [field, dir] = parseSort(
      q.sort,
      ['createdAt', 'number', 'status', 'chargebackTotal'] as const,
      ['createdAt', 'desc'],
    );
    // Amounts in different currencies are not comparable without a rate, and none is
    // applied: the chargeback sort groups by ISO 4217 code, then orders within each.
    const orderBy =
      field === 'chargebackTotal'
        ? { currency: 'asc' as const, chargebackTotal: dir, id: dir }
        : { [field]: dir, id: dir };
    const [items, total] = await this.em.findAndCount(VendorReturn, this.where(q), {
      populate: POPULATE,
      orderBy,
      limit: pageSize,
      offset,
    });
    return { items: items.map(returnView), total, page, pageSize };
  }

  /** The filtered list in blocks of 200, for the CSV export. */
  async *listBlocks(q: ListReturnsDto): AsyncGenerator<ReturnView[]> {
    const em = this.em.fork();
    for (let offset = 0; ; offset += 200) {
      const rows = await em.find(VendorReturn, this.where(q), {
        populate: POPULATE,
        orderBy: { createdAt: 'desc', id: 'desc' },
        limit: 200,
        offset,
      });
      if (rows.length) yield rows.map(returnView);
      if (rows.length < 200) return;
      em.clear();
    }
  }

  /** The 409 with the return as it stands now. */
  private async stale(id: number): Promise<DomainError> {
    const current = await this.load(this.em.fork(), id);
    return new DomainError(
      'conflict',
      [
        {
          field: null,
          message: `Someone changed return ${current.number} first; review it as it is now and try again`,
        },
      ],
      { current: returnView(current) },
    );
  }

  /**
   * Runs one change of a return in a transaction on the version the client saw. The row is
   * written with `where version = ?` (MikroORM's optimistic lock), so of two changes made
   * at once on one version, one wins and the other gets 409 with the current state.
   */
  private async change(
    id: number,
    version: number | undefined,
    actor: RequestUser,
    work: (tx: EntityManager, ret: VendorReturn) => Promise<string>,
  ): Promise<ReturnView> {
    try {
      return await retryOnUniqueConflict(
        () =>
          this.em.transactional(async (tx) => {
            const ret = await this.load(tx, id);
            if (version !== undefined && version !== ret.version) {
              throw new DomainError(
                'conflict',
                [
                  {
                    field: null,
                    message: `Someone changed return ${ret.number} first; review it as it is now and try again`,
                  },
                ],
                { current: returnView(ret) },
              );
            }
            const before = audited(ret);
            const beforeLots = ret.lots.getItems().map((l) => l.id);
            const action = await work(tx, ret);
            // Every change writes the row, so its version moves even when only the lots did.
            ret.updatedAt = clock.now();
            await tx.flush();
            const lotIds = new Set([...beforeLots, ...ret.lots.getItems().map((l) => l.id)]);
            for (const lotId of lotIds) {
              this.audit.record(tx, actor, {
                action,
                entityType: 'vendor_return',
                entityId: ret.id,
                lotId,
                before,
                after: audited(ret),
              });
            }
            await tx.flush();
            return returnView(ret);
          }),
        2,
      );
    } catch (e) {
      if (e instanceof OptimisticLockError) throw await this.stale(id);
      throw e;
    }
  }

  private refuseClosed(ret: VendorReturn) {
    if (ret.status === 'closed' || ret.status === 'cancelled') {
      throw DomainError.refused(`Return ${ret.number} is ${ret.status}; it cannot change`);
    }
  }

  private draftOnly(ret: VendorReturn, what: string) {
    if (ret.status !== 'draft') {
      throw DomainError.refused(
        `Return ${ret.number} is ${STEP_WORDS[ret.status]}: ${what} can change only while it is a draft`,
      );
    }
  }

  update(id: number, dto: UpdateReturnDto, actor: RequestUser): Promise<ReturnView> {
    if (dto.currency !== undefined) checkCurrency(dto.currency);
    return this.change(id, dto.version, actor, async (tx, ret) => {
      this.refuseClosed(ret);
      if (dto.rmaNumber !== undefined) ret.rmaNumber = dto.rmaNumber.trim() || null;
      if (dto.notes !== undefined) ret.notes = dto.notes.trim() || null;
      if (dto.supplierNote !== undefined) ret.supplierNote = dto.supplierNote.trim() || null;
      if (dto.shareDecisionReason !== undefined) ret.shareDecisionReason = dto.shareDecisionReason;
      if (dto.costs !== undefined) {
        this.draftOnly(ret, 'the costs');
        ret.costs = cleanCosts(dto.costs);
        ret.chargebackTotal = chargeback(ret.costs);
      }
      if (dto.currency !== undefined && dto.currency !== ret.currency) {
        this.draftOnly(ret, 'the currency');
        ret.currency = dto.currency;
      }
      if (dto.lotIds !== undefined) {
        const now = ret.lots.getItems().map((l) => l.id);
        const added = dto.lotIds.filter((lid) => !now.includes(lid));
        const removed = now.filter((lid) => !dto.lotIds!.includes(lid));
        if (added.length || removed.length) {
          this.draftOnly(ret, 'the lots');
          const lots = added.length ? await this.returnableLots(tx, added, ret.id) : [];
          const other = lots.find((l) => l.supplier.id !== ret.supplier.id);
          if (other) {
            throw DomainError.refused(
              `Lot ${other.id} came from another supplier than ${ret.supplier.name}; a return goes to one supplier`,
            );
          }
          if (removed.length) {
            await tx.nativeDelete(OpenReturnLot, { vendorReturn: ret.id, lot: { $in: removed } });
            for (const l of ret.lots.getItems().filter((x) => removed.includes(x.id)))
              ret.lots.remove(l);
          }
          for (const lot of lots) {
            ret.lots.add(lot);
            tx.create(OpenReturnLot, { lot, vendorReturn: ret });
          }
        }
      }
      return 'return.update';
    });
  }

  private move(tx: EntityManager, actor: RequestUser, ret: VendorReturn, to: ReturnStatus) {
    if (!canMove(ret.status, to)) {
      const next = allowedNext(ret.status).map((s) => STEP_WORDS[s]);
      throw DomainError.refused(
        `Return ${ret.number} is ${STEP_WORDS[ret.status]}: it can go on to ${next.length ? next.join(' or ') : 'nothing'}, not ${STEP_WORDS[to]}`,
      );
    }
    if (ret.status === 'draft' && to !== 'cancelled') this.leaveDraft(tx, actor, ret);
    ret.status = to;
  }

  /** The lots go back: each must still be rejected, and becomes returned. */
  private leaveDraft(tx: EntityManager, actor: RequestUser, ret: VendorReturn) {
    const redecided = ret.lots.getItems().filter((l) => l.status !== 'rejected');
    if (redecided.length) {
      throw DomainError.refused(
        `Lot ${redecided.map((l) => l.id).join(', ')} is no longer rejected; take it off the return first`,
      );
    }
    for (const lot of ret.lots.getItems()) {
      lot.status = 'returned';
      this.audit.record(tx, actor, {
        action: 'lot.returned',
        entityType: 'lot',
        entityId: lot.id,
        lotId: lot.id,
        before: { status: 'rejected' },
        after: { status: 'returned', returnNumber: ret.number },
      });
    }
  }

  /** Frees the lots for another return (cancelled or closed). */
  private async release(tx: EntityManager, ret: VendorReturn) {
    await tx.nativeDelete(OpenReturnLot, { vendorReturn: ret.id });
  }

  cancel(id: number, dto: CancelReturnDto, actor: RequestUser): Promise<ReturnView> {
    return this.change(id, dto.version, actor, async (tx, ret) => {
      this.move(tx, actor, ret, 'cancelled');
      ret.cancelReason = dto.reason.trim();
      ret.cancelledAt = clock.now();
      await this.release(tx, ret);
      return 'return.cancel';
    });
  }

  /** The notice went (or is queued) to the supplier; called by the e-mail of a draft. */
  markEmailed(id: number, actor: RequestUser): Promise<ReturnView> {
    return this.change(id, undefined, actor, async (tx, ret) => {
      this.refuseClosed(ret);
      if (ret.status === 'draft') this.move(tx, actor, ret, 'emailed');
      ret.emailedAt = clock.now();
      return 'return.emailed';
    });
  }

  ship(id: number, dto: ShipReturnDto, actor: RequestUser): Promise<ReturnView> {
    if (!isCalendarDate(dto.shippedOn)) {
      throw DomainError.refused('shippedOn must be a real date YYYY-MM-DD', 'shippedOn');
    }
    return this.change(id, dto.version, actor, async (tx, ret) => {
      this.move(tx, actor, ret, 'shipped');
      ret.carrier = dto.carrier.trim();
      ret.trackingNumber = dto.trackingNumber?.trim() || null;
      ret.shippedOn = dto.shippedOn;
      ret.shippedQuantity = dto.quantity;
      return 'return.ship';
    });
  }

  acknowledge(id: number, dto: AcknowledgeReturnDto, actor: RequestUser): Promise<ReturnView> {
    return this.change(id, dto.version, actor, async (tx, ret) => {
      this.move(tx, actor, ret, 'acknowledged');
      if (dto.rmaNumber?.trim()) ret.rmaNumber = dto.rmaNumber.trim();
      ret.acknowledgedAt = clock.now();
      return 'return.acknowledge';
    });
  }

  credit(id: number, dto: CreditReturnDto, actor: RequestUser): Promise<ReturnView> {
    return this.change(id, dto.version, actor, async (tx, ret) => {
      this.move(tx, actor, ret, 'credited');
      ret.creditNoteNumber = dto.creditNoteNumber.trim();
      ret.creditAmount = dto.creditAmount;
      ret.creditedAt = clock.now();
      return 'return.credit';
    });
  }

  close(id: number, dto: ReturnStepDto, actor: RequestUser): Promise<ReturnView> {
    return this.change(id, dto.version, actor, async (tx, ret) => {
      this.move(tx, actor, ret, 'closed');
      ret.closedAt = clock.now();
      await this.release(tx, ret);
      return 'return.close';
    });
  }
}
