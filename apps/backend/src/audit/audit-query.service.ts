import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager, type FilterQuery } from '@mikro-orm/core';
import { paging, parseSort, type Page } from '../common/paging';
import { Sample } from '../inspection/entities/sample.entity';
import { Lot } from '../lots/entities/lot.entity';
import { User } from '../users/entities/user.entity';
import { ListAuditDto } from './dto/list-audit.dto';
import { AuditEvent } from './entities/audit-event.entity';
import { summarize, type SampleContext } from './timeline-summary';

export interface TimelineEvent {
  id: number;
  at: Date;
  actor: { id: number; name: string } | null;
  actorEmail: string;
  action: string;
  entityType: string;
  entityId: number | null;
  lotId: number | null;
  summary: string;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
}

function instant(value: string, endOfDay: boolean): Date {
  const d = new Date(value.length === 10 ? `${value}T00:00:00.000Z` : value);
  if (Number.isNaN(d.getTime())) throw new BadRequestException([`${value} is not a date`]);
  return endOfDay && value.length === 10 ? new Date(d.getTime() + 86_400_000 - 1) : d;
}

/** Reads the append-only audit trail: a lot's timeline and the admin's filtered list. */
@Injectable()
export class AuditQueryService {
  constructor(private readonly em: EntityManager) {}

  async timeline(lotId: number): Promise<TimelineEvent[]> {
    if (!(await this.em.count(Lot, { id: lotId })))
      throw new NotFoundException(`There is no lot ${lotId}`);
    const events = await this.em.find(AuditEvent, { lotId }, { orderBy: { at: 'asc', id: 'asc' } });
    return this.views(events);
  }

  async list(q: ListAuditDto): Promise<Page<TimelineEvent>> {
    const { page, pageSize, offset } = paging(q);
    const [field, dir] = parseSort(q.sort, ['at', 'action', 'entityType'] as const, ['at', 'desc']);
    const where: FilterQuery<AuditEvent> = {};
    if (q.entityType) where.entityType = q.entityType;
    if (q.action) where.action = q.action;
    if (q.actorId) where.actorId = q.actorId;
    if (q.from || q.to) {
      where.at = {
        ...(q.from ? { $gte: instant(q.from, false) } : {}),
        ...(q.to ? { $lte: instant(q.to, true) } : {}),
      };
    }
    const [events, total] = await this.em.findAndCount(AuditEvent, where, {
      orderBy: { [field]: dir, id: dir },
      limit: pageSize,
      offset,
    });
    return { items: await this.views(events), total, page, pageSize };
  }

  private async views(events: AuditEvent[]): Promise<TimelineEvent[]> {
    const actorIds = [
      ...new Set(events.map((e) => e.actorId).filter((id): id is number => id !== null)),
    ];
    const users = actorIds.length ? await this.em.find(User, { id: { $in: actorIds } }) : [];
    const names = new Map(users.map((u) => [u.id, u.name]));
    const samples = await this.sampleContexts(events);
    return events.map((e) => {
      const name = e.actorId !== null ? (names.get(e.actorId) ?? e.actorEmail) : 'The system';
      const sampleId = sampleIdOf(e);
      return {
        id: e.id,
        at: e.at,
        actor: e.actorId !== null ? { id: e.actorId, name } : null,
        actorEmail: e.actorEmail,
        action: e.action,
        entityType: e.entityType,
        entityId: e.entityId,
        lotId: e.lotId,
        summary: summarize(e, name, sampleId !== null ? samples.get(sampleId) : undefined),
        before: e.before,
        after: e.after,
      };
    });
  }

  private async sampleContexts(events: AuditEvent[]): Promise<Map<number, SampleContext>> {
    const ids = [...new Set(events.map(sampleIdOf).filter((id): id is number => id !== null))];
    if (ids.length === 0) return new Map();
    const samples = await this.em.find(Sample, { id: { $in: ids } }, { populate: ['conductor'] });
    return new Map(samples.map((s) => [s.id, { seq: s.seq, purpose: s.conductor.purpose }]));
  }
}

function sampleIdOf(e: AuditEvent): number | null {
  if (e.entityType === 'sample') return e.entityId;
  const id = e.after?.sampleId ?? e.before?.sampleId;
  return typeof id === 'number' ? id : null;
}
