import { DomainError } from '../common/domain-error';
import { Injectable } from '@nestjs/common';
import { EntityManager, type FilterQuery } from '@mikro-orm/core';
import type { RequestUser } from '../auth/request-user';
import type { CsvRow } from '../common/csv';
import { paging, parseSort, type Page } from '../common/paging';
import { Sample } from '../inspection/entities/sample.entity';
import { Lot } from '../lots/entities/lot.entity';
import { User } from '../users/entities/user.entity';
import { AuditService } from '../audit/audit.service';
import { ListAuditDto } from './dto/list-audit.dto';
import { AuditEvent } from '../audit/entities/audit-event.entity';
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

function instant(value: string, endOfDay: boolean, field: 'from' | 'to'): Date {
  const d = new Date(value.length === 10 ? `${value}T00:00:00.000Z` : value);
  if (Number.isNaN(d.getTime()))
    throw DomainError.invalid([{ field, message: `${value} is not a date` }]);
  return endOfDay && value.length === 10 ? new Date(d.getTime() + 86_400_000 - 1) : d;
}

/** Columns of the audit trail's CSV, one event a row (before and after as JSON text). */
export const AUDIT_CSV_COLUMNS = [
  'eventId',
  'at',
  'actorId',
  'actorEmail',
  'actorName',
  'action',
  'entityType',
  'entityId',
  'lotId',
  'summary',
  'before',
  'after',
] as const;

/** Events per page of the CSV export (our choice: memory stays flat). */
const AUDIT_EXPORT_PAGE = 500;
/** An export is for a spreadsheet; beyond this, narrow the filters (common practice, no source). */
export const AUDIT_EXPORT_MAX_ROWS = 100_000;
const SORTS = ['at', 'action', 'entityType'] as const;

/** Reads the append-only audit trail: a lot's timeline and the admin's filtered list. */
@Injectable()
export class AuditQueryService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async timeline(lotId: number): Promise<TimelineEvent[]> {
    if (!(await this.em.count(Lot, { id: lotId })))
      throw DomainError.notFound(`There is no lot ${lotId}`);
    const events = await this.em.find(AuditEvent, { lotId }, { orderBy: { at: 'asc', id: 'asc' } });
    return this.views(events);
  }

  async list(q: ListAuditDto): Promise<Page<TimelineEvent>> {
    const { page, pageSize, offset } = paging(q);
    const [field, dir] = parseSort(q.sort, SORTS, ['at', 'desc']);
    const [events, total] = await this.em.findAndCount(AuditEvent, this.where(q), {
      orderBy: { [field]: dir, id: dir },
      limit: pageSize,
      offset,
    });
    return { items: await this.views(events), total, page, pageSize };
  }

  /** What occurs in the trail, for the screen's filters: actions, record types, people. */
  async facets() {
    const conn = this.em.getConnection();
    const actions = await conn.execute<{ action: string }[]>(
      'select distinct action from audit_events order by action',
    );
    const types = await conn.execute<{ entity_type: string }[]>(
      'select distinct entity_type from audit_events order by entity_type',
    );
    const people = await this.em.find(User, {}, { orderBy: { name: 'asc', id: 'asc' } });
    return {
      actions: actions.map((r: { action: string }) => r.action),
      entityTypes: types.map((r: { entity_type: string }) => r.entity_type),
      people: people.map((u) => ({ id: u.id, name: u.name, email: u.email })),
    };
  }

  /**
   * The filtered trail as CSV rows in pages, sorted as the list. Refused with 422 above
   * AUDIT_EXPORT_MAX_ROWS; the export itself is audited (audit.export) before its first row.
   */
  async exportRows(q: ListAuditDto, actor: RequestUser): Promise<AsyncGenerator<CsvRow[]>> {
    const [field, dir] = parseSort(q.sort, SORTS, ['at', 'desc']);
    const em = this.em.fork();
    const where = this.where(q);
    const total = await em.count(AuditEvent, where);
    if (total > AUDIT_EXPORT_MAX_ROWS) {
      throw DomainError.refused(
        `${total} events match; narrow the filters to at most ${AUDIT_EXPORT_MAX_ROWS} for one export.`,
      );
    }
    const { page: _p, pageSize: _s, ...filters } = q;
    this.audit.record(em, actor, {
      action: 'audit.export',
      entityType: 'audit_event',
      after: { filters: { ...filters }, rows: total },
    });
    await em.flush();
    return this.exportPages(em, where, { [field]: dir, id: dir }, total);
  }

  private async *exportPages(
    em: EntityManager,
    where: FilterQuery<AuditEvent>,
    orderBy: Record<string, 'asc' | 'desc'>,
    total: number,
  ): AsyncGenerator<CsvRow[]> {
    for (let offset = 0; offset < total; offset += AUDIT_EXPORT_PAGE) {
      const events = await em.find(AuditEvent, where, {
        orderBy,
        limit: AUDIT_EXPORT_PAGE,
        offset,
      });
      if (events.length === 0) return;
      const views = await this.views(events, em);
      yield views.map((e) => [
        e.id,
        new Date(e.at).toISOString(),
        e.actor?.id ?? null,
        e.actorEmail,
        e.actor?.name ?? 'The system',
        e.action,
        e.entityType,
        e.entityId,
        e.lotId,
        e.summary,
        e.before ? JSON.stringify(e.before) : null,
        e.after ? JSON.stringify(e.after) : null,
      ]);
      em.clear();
    }
  }

  private where(q: ListAuditDto): FilterQuery<AuditEvent> {
    const where: FilterQuery<AuditEvent> = {};
    if (q.entityType) where.entityType = q.entityType;
    if (q.entityId) where.entityId = q.entityId;
    if (q.action) where.action = q.action;
    if (q.actorId) where.actorId = q.actorId;
    if (q.from || q.to) {
      const from = q.from ? instant(q.from, false, 'from') : null;
      const to = q.to ? instant(q.to, true, 'to') : null;
      if (from && to && from > to)
        throw DomainError.invalid([{ field: 'from', message: 'from must be on or before to' }]);
      where.at = {
        ...(from ? { $gte: from } : {}),
        ...(to ? { $lte: to } : {}),
      };
    }
    return where;
  }

  private async views(events: AuditEvent[], em = this.em): Promise<TimelineEvent[]> {
    const actorIds = [
      ...new Set(events.map((e) => e.actorId).filter((id): id is number => id !== null)),
    ];
    const users = actorIds.length ? await em.find(User, { id: { $in: actorIds } }) : [];
    const names = new Map(users.map((u) => [u.id, u.name]));
    const samples = await this.sampleContexts(events, em);
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

  private async sampleContexts(
    events: AuditEvent[],
    em = this.em,
  ): Promise<Map<number, SampleContext>> {
    const ids = [...new Set(events.map(sampleIdOf).filter((id): id is number => id !== null))];
    if (ids.length === 0) return new Map();
    const samples = await em.find(Sample, { id: { $in: ids } }, { populate: ['conductor'] });
    return new Map(samples.map((s) => [s.id, { seq: s.seq, purpose: s.conductor.purpose }]));
  }
}

function sampleIdOf(e: AuditEvent): number | null {
  if (e.entityType === 'sample') return e.entityId;
  const id = e.after?.sampleId ?? e.before?.sampleId;
  return typeof id === 'number' ? id : null;
}
