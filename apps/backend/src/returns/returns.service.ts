import { Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import type { SqlEntityManager } from '@mikro-orm/knex';
import { EntityManager, type FilterQuery } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { formatNumber, nextSeqInYear, retryOnUniqueConflict } from '../common/numbering';
import { paging, parseSort, type Page } from '../common/paging';
import { Lot } from '../lots/entities/lot.entity';
import { User } from '../users/entities/user.entity';
import { CreateReturnDto } from './dto/create-return.dto';
import { ListReturnsDto } from './dto/list-returns.dto';
import { UpdateReturnDto } from './dto/update-return.dto';
import { VendorReturn, type ReturnStatus } from './entities/vendor-return.entity';
import { canMove, chargeback, cleanCosts, OPEN_RETURN } from './return-rules';
import { returnView, type ReturnView } from './return-view';
import { plainSql } from '../common/plain-sql';

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
  rmaNumber: r.rmaNumber,
  notes: r.notes,
  costs: r.costs,
  chargebackTotal: r.chargebackTotal,
});

@Injectable()
export class ReturnsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  create(dto: CreateReturnDto, actor: RequestUser): Promise<ReturnView> {
    return retryOnUniqueConflict(() =>
      this.em.transactional((tx) => this.createIn(tx, dto, actor)),
    );
  }

  private async createIn(tx: EntityManager, dto: CreateReturnDto, actor: RequestUser) {
    const lots = await tx.find(Lot, { id: { $in: dto.lotIds } }, { populate: ['supplier'] });
    const missing = dto.lotIds.filter((id) => !lots.some((l) => l.id === id));
    if (missing.length)
      throw new UnprocessableEntityException(`There is no lot ${missing.join(', ')}`);
    const notRejected = lots.filter((l) => l.status !== 'rejected');
    if (notRejected.length) {
      throw new UnprocessableEntityException(
        `Only rejected lots go back to the supplier: ${notRejected.map((l) => `lot ${l.id} is ${l.status.replace(/_/g, ' ')}`).join('; ')}`,
      );
    }
    const suppliers = new Set(lots.map((l) => l.supplier.id));
    if (suppliers.size > 1) {
      throw new UnprocessableEntityException(
        'A return goes to one supplier: choose lots of one supplier only',
      );
    }
    const open = await tx.find(
      VendorReturn,
      { lots: { id: { $in: dto.lotIds } }, status: { $in: [...OPEN_RETURN] } },
      { populate: ['lots'] },
    );
    if (open.length) {
      const taken = open.map(
        (r) =>
          `${r.number} (lots ${r.lots
            .getItems()
            .map((l) => l.id)
            .filter((id) => dto.lotIds.includes(id))
            .join(', ')})`,
      );
      throw new UnprocessableEntityException(
        `These lots are already on an open return: ${taken.join('; ')}`,
      );
    }
    const year = new Date().getUTCFullYear();
    const costs = cleanCosts(dto.costs);
    const ret = tx.create(VendorReturn, {
      number: formatNumber('RTV', year, await nextSeqInYear(tx, VendorReturn, 'RTV', year)),
      supplier: lots[0].supplier,
      rmaNumber: dto.rmaNumber?.trim() || null,
      notes: dto.notes?.trim() || null,
      costs,
      chargebackTotal: chargeback(costs),
      createdBy: tx.getReference(User, actor.id),
    });
    ret.lots.set(lots);
    await tx.flush();
    for (const lot of lots) {
      this.audit.record(tx, actor, {
        action: 'return.create',
        entityType: 'vendor_return',
        entityId: ret.id,
        lotId: lot.id,
        after: { ...audited(ret), lotIds: dto.lotIds },
      });
    }
    await tx.populate(ret, POPULATE);
    return returnView(ret);
  }

  async get(id: number): Promise<ReturnView> {
    return returnView(await this.load(this.em, id));
  }

  /** A return to build documents from, in a manager of its own. */
  /** Number and lot ids of a return, read without loading its lots (the CSV's needs). */
  async ref(id: number): Promise<ReturnRef> {
    const sql = this.em as SqlEntityManager;
    const [ret] = await plainSql<{ id: number; number: string }[]>(
      sql,
      'select id, number from vendor_returns where id = ?',
      [id],
    );
    if (!ret) throw new NotFoundException(`There is no return ${id}`);
    const lots = await plainSql<{ lotId: number }[]>(
      sql,
      'select lot_id as "lotId" from vendor_return_lots where vendor_return_id = ? order by lot_id',
      [id],
    );
    return { id: ret.id, number: ret.number, lotIds: lots.map((l) => l.lotId) };
  }

  loadForDocuments(id: number): Promise<VendorReturn> {
    return this.load(this.em.fork(), id);
  }

  async load(em: EntityManager, id: number): Promise<VendorReturn> {
    const ret = await em.findOne(VendorReturn, id, { populate: POPULATE });
    if (!ret) throw new NotFoundException(`There is no return ${id}`);
    return ret;
  }

  private where(q: ListReturnsDto): FilterQuery<VendorReturn> {
    const where: FilterQuery<VendorReturn> = {};
    if (q.status) where.status = { $in: q.status.split(',') as ReturnStatus[] };
    if (q.supplierId) where.supplier = q.supplierId;
    return where;
  }

  async list(q: ListReturnsDto): Promise<Page<ReturnView>> {
    const { page, pageSize, offset } = paging(q);
    const [field, dir] = parseSort(
      q.sort,
      ['createdAt', 'number', 'status', 'chargebackTotal'] as const,
      ['createdAt', 'desc'],
    );
    const [items, total] = await this.em.findAndCount(VendorReturn, this.where(q), {
      populate: POPULATE,
      orderBy: { [field]: dir, id: dir },
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

  update(id: number, dto: UpdateReturnDto, actor: RequestUser): Promise<ReturnView> {
    return this.em.transactional(async (tx) => {
      const ret = await this.load(tx, id);
      const before = audited(ret);
      if (ret.status === 'closed')
        throw new UnprocessableEntityException(`Return ${ret.number} is closed; it cannot change`);
      if (dto.status && !canMove(ret.status, dto.status)) {
        throw new UnprocessableEntityException(
          `A return goes draft → sent → acknowledged → closed, one step at a time; ${ret.number} cannot go from ${ret.status} to ${dto.status}`,
        );
      }
      if (dto.rmaNumber !== undefined) ret.rmaNumber = dto.rmaNumber.trim() || null;
      if (dto.notes !== undefined) ret.notes = dto.notes.trim() || null;
      if (dto.costs !== undefined) {
        ret.costs = cleanCosts(dto.costs);
        ret.chargebackTotal = chargeback(ret.costs);
      }
      const sending = dto.status === 'sent' && ret.status === 'draft';
      const redecided = ret.lots.getItems().filter((l) => l.status !== 'rejected');
      if (sending && redecided.length) {
        throw new UnprocessableEntityException(
          `Lot ${redecided.map((l) => l.id).join(', ')} is no longer rejected; take it off the return before sending`,
        );
      }
      if (dto.status) ret.status = dto.status;
      for (const lot of ret.lots.getItems()) {
        if (sending) {
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
        this.audit.record(tx, actor, {
          action: 'return.update',
          entityType: 'vendor_return',
          entityId: ret.id,
          lotId: lot.id,
          before,
          after: audited(ret),
        });
      }
      await tx.flush();
      return returnView(ret);
    });
  }
}
