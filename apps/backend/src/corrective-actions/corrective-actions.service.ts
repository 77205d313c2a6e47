import { DomainError } from '../common/domain-error';
import { Injectable } from '@nestjs/common';
import { EntityManager, OptimisticLockError, type FilterQuery } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { isCalendarDate, isoDate } from '../common/calendar';
import { formatNumber, nextSeqInYear, retryOnUniqueConflict } from '../common/numbering';
import { paging, parseSort, type Page } from '../common/paging';
import { Lot } from '../lots/entities/lot.entity';
import { Supplier } from '../suppliers/entities/supplier.entity';
import { User } from '../users/entities/user.entity';
import { allowedNext, AWAITING_SUPPLIER, canMove } from './corrective-action-rules';
import { correctiveActionView, type CorrectiveActionView } from './corrective-action-view';
import { CreateCorrectiveActionDto } from './dto/create-corrective-action.dto';
import { ListCorrectiveActionsDto } from './dto/list-corrective-actions.dto';
import { UpdateCorrectiveActionDto } from './dto/update-corrective-action.dto';
import { CorrectiveAction, type CorrectiveActionStatus } from './entities/corrective-action.entity';
import { clock } from '../common/clock';

const POPULATE = ['supplier', 'lots', 'createdBy', 'verifiedBy', 'verifiedLot'] as const;
const RESPONSE_FIELDS = ['containment', 'rootCause', 'correctiveAction'] as const;
const today = () => isoDate(clock.now());

function audited(c: CorrectiveAction) {
  return {
    number: c.number,
    status: c.status,
    dueOn: c.dueOn,
    problem: c.problem,
    containment: c.containment,
    rootCause: c.rootCause,
    correctiveAction: c.correctiveAction,
  };
}

function checkDate(field: string, value: string): void {
  if (!isCalendarDate(value))
    throw DomainError.invalid([
      { field: field, message: `${field} must be a real date YYYY-MM-DD` },
    ]);
}

@Injectable()
export class CorrectiveActionsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  private record(
    tx: EntityManager,
    actor: RequestUser,
    c: CorrectiveAction,
    action: string,
    before: object | null,
  ) {
    const lots = c.lots.getItems();
    for (const lotId of lots.length ? lots.map((l) => l.id) : [null]) {
      this.audit.record(tx, actor, {
        action,
        entityType: 'corrective_action',
        entityId: c.id,
        lotId,
        before: before as Record<string, unknown> | null,
        after: audited(c),
      });
    }
  }

  create(dto: CreateCorrectiveActionDto, actor: RequestUser): Promise<CorrectiveActionView> {
    checkDate('dueOn', dto.dueOn);
    if (dto.dueOn < today())
      throw DomainError.invalid([{ field: 'dueOn', message: 'dueOn must be today or later' }]);
    return retryOnUniqueConflict(() =>
      this.em.transactional(async (tx) => {
        const supplier = await tx.findOne(Supplier, dto.supplierId);
        if (!supplier)
          throw DomainError.refused(`There is no supplier ${dto.supplierId}`, 'supplierId');
        const lots = dto.lotIds.length ? await tx.find(Lot, { id: { $in: dto.lotIds } }) : [];
        const missing = dto.lotIds.filter((id) => !lots.some((l) => l.id === id));
        if (missing.length)
          throw DomainError.refused(`There is no lot ${missing.join(', ')}`, 'lotIds');
        const others = lots.filter((l) => l.supplier.id !== supplier.id);
        if (others.length) {
          throw DomainError.refused(
            `Lot ${others.map((l) => l.id).join(', ')} came from another supplier than ${supplier.name}`,
            'lotIds',
          );
        }
        const year = clock.now().getUTCFullYear();
        const car = tx.create(CorrectiveAction, {
          number: formatNumber(
            'SCAR',
            year,
            await nextSeqInYear(tx, CorrectiveAction, 'SCAR', year),
          ),
          supplier,
          problem: dto.problem.trim(),
          dueOn: dto.dueOn,
          createdBy: tx.getReference(User, actor.id),
        });
        car.lots.set(lots);
        await tx.flush();
        this.record(tx, actor, car, 'corrective_action.create', null);
        await tx.populate(car, POPULATE);
        return correctiveActionView(car, today());
      }),
    );
  }

  private async load(em: EntityManager, id: number) {
    const car = await em.findOne(CorrectiveAction, id, { populate: POPULATE });
    if (!car) throw DomainError.notFound(`There is no corrective action ${id}`);
    return car;
  }

  async get(id: number) {
    return correctiveActionView(await this.load(this.em, id), today());
  }

  private where(q: ListCorrectiveActionsDto): FilterQuery<CorrectiveAction> {
    const where: FilterQuery<CorrectiveAction> = {};
    const statuses = q.status ? (q.status.split(',') as CorrectiveActionStatus[]) : null;
    if (statuses) where.status = { $in: statuses };
    if (q.supplierId) where.supplier = q.supplierId;
    if (q.overdue === true) {
      where.dueOn = { $lt: today() };
      const awaiting = AWAITING_SUPPLIER.filter((s) => !statuses || statuses.includes(s));
      where.status = { $in: awaiting };
    }
    return where;
  }

  async list(q: ListCorrectiveActionsDto): Promise<Page<CorrectiveActionView>> {
    const { page, pageSize, offset } = paging(q);
    const [field, dir] = parseSort(q.sort, ['createdAt', 'dueOn', 'number', 'status'] as const, [
      'createdAt',
      'desc',
    ]);
    const [items, total] = await this.em.findAndCount(CorrectiveAction, this.where(q), {
      populate: POPULATE,
      orderBy: { [field]: dir, id: dir },
      limit: pageSize,
      offset,
    });
    const day = today();
    return { items: items.map((c) => correctiveActionView(c, day)), total, page, pageSize };
  }

  /** The filtered list in blocks of 200, for the CSV export. */
  async *listBlocks(q: ListCorrectiveActionsDto): AsyncGenerator<CorrectiveActionView[]> {
    const em = this.em.fork();
    const day = today();
    for (let offset = 0; ; offset += 200) {
      const rows = await em.find(CorrectiveAction, this.where(q), {
        populate: POPULATE,
        orderBy: { createdAt: 'desc', id: 'desc' },
        limit: 200,
        offset,
      });
      if (rows.length) yield rows.map((c) => correctiveActionView(c, day));
      if (rows.length < 200) return;
      em.clear();
    }
  }

  /** The 409 with the request as it stands now. */
  private async stale(id: number, em: EntityManager = this.em.fork()) {
    const current = await this.load(em, id);
    return new DomainError(
      'conflict',
      [
        {
          field: null,
          message: `Someone changed ${current.number} first; review it as it is now and try again`,
        },
      ],
      { current: correctiveActionView(current, today()) },
    );
  }

  /**
   * Edits and steps are taken on the version the client saw; the row is written with
   * `where version = ?`, so of two changes made at once, one wins and the other gets 409.
   */
  async update(
    id: number,
    dto: UpdateCorrectiveActionDto,
    actor: RequestUser,
  ): Promise<CorrectiveActionView> {
    if (dto.dueOn !== undefined) checkDate('dueOn', dto.dueOn);
    try {
      return await this.em.transactional(async (tx) => {
        const car = await this.load(tx, id);
        if (dto.version !== car.version) throw await this.stale(id, tx);
        if (car.status === 'closed')
          throw DomainError.refused(`${car.number} is closed; it cannot change`);
        const before = audited(car);
        const to = dto.status ?? car.status;
        if (!canMove(car.status, to)) {
          const next = allowedNext(car.status);
          throw DomainError.refused(
            `${car.number} is ${car.status}: it can go to ${next.join(' or ')}, not to ${to}`,
          );
        }
        if (dto.problem !== undefined) car.problem = dto.problem.trim();
        if (dto.dueOn !== undefined) car.dueOn = dto.dueOn;
        for (const f of RESPONSE_FIELDS) if (dto[f] !== undefined) car[f] = dto[f].trim() || null;
        if (to === 'responded' && car.status !== 'responded') {
          const missing = RESPONSE_FIELDS.filter((f) => !car[f]);
          if (missing.length) {
            throw DomainError.refused(
              `Record the supplier's ${missing.join(', ')} before marking ${car.number} responded`,
            );
          }
          car.respondedAt = clock.now();
        }
        if (to === 'reopened' && car.status !== 'reopened') {
          if (!dto.comment?.trim()) {
            throw DomainError.refused(
              `Say what more the supplier must do (comment) before reopening ${car.number}; it is e-mailed to them`,
              'comment',
            );
          }
          car.reopenComment = dto.comment.trim();
        }
        if (to === 'verified' && car.status !== 'verified') {
          if (!dto.verificationNote?.trim() && !dto.verifiedLotId) {
            throw DomainError.refused(
              `Give the evidence that the fix works before verifying ${car.number}: a note (verificationNote) or a later lot that passed (verifiedLotId)`,
              'verificationNote',
            );
          }
          if (dto.verifiedLotId) {
            const lot = await tx.findOne(Lot, dto.verifiedLotId);
            const passed = lot?.status === 'accepted';
            if (
              !lot ||
              lot.supplier.id !== car.supplier.id ||
              !passed ||
              lot.receivedAt <= car.createdAt
            ) {
              throw DomainError.refused(
                `Lot ${dto.verifiedLotId} is no evidence: it must be a lot of ${car.supplier.name} received after ${car.number} was raised and accepted`,
                'verifiedLotId',
              );
            }
            car.verifiedLot = lot;
          }
          car.verificationNote = dto.verificationNote?.trim() || null;
          car.verifiedBy = tx.getReference(User, actor.id);
          car.verifiedAt = clock.now();
        }
        if (to === 'responded' && car.status !== 'responded') car.respondedBy = actor.email;
        if (to === 'closed') car.closedAt = clock.now();
        car.status = to;
        car.updatedAt = clock.now();
        await tx.flush();
        this.record(tx, actor, car, 'corrective_action.update', before);
        await tx.populate(car, POPULATE);
        return correctiveActionView(car, today());
      });
    } catch (e) {
      if (e instanceof OptimisticLockError) throw await this.stale(id);
      throw e;
    }
  }
}
