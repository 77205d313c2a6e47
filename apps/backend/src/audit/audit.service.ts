import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import type { RequestUser } from '../auth/request-user';
import { AuditEvent } from './entities/audit-event.entity';
import { plainSql } from '../common/plain-sql';
import { clock } from '../common/clock';

export interface AuditEntry {
  action: string;
  entityType: string;
  entityId?: number | null;
  lotId?: number | null;
  before?: Record<string, unknown> | null;
  after?: Record<string, unknown> | null;
}

/**
 * Appends audit events. Pass the EntityManager of the unit of work the change is in,
 * so the event is stored in the same transaction as the change, or not at all.
 */
/** Events per insert statement (our choice: nine values each, far below the limits). */
const APPEND_BATCH = 100;

@Injectable()
export class AuditService {
  record(em: EntityManager, actor: RequestUser | null, entry: AuditEntry): AuditEvent {
    const event = em.create(AuditEvent, {
      actorId: actor?.id ?? null,
      actorEmail: actor?.email ?? 'system',
      action: entry.action,
      entityType: entry.entityType,
      entityId: entry.entityId ?? null,
      lotId: entry.lotId ?? null,
      before: entry.before ?? null,
      after: entry.after ?? null,
      at: clock.now(),
    });
    em.persist(event);
    return event;
  }

  /**
   * The same events as `record`, written through `em`'s current transaction with one
   * insert per hundred events (bound values stay under every driver's limit), for the
   * paths that write their rows with SQL (reading entry). `at`: when they happened.
   */
  async append(
    em: EntityManager,
    actor: RequestUser | null,
    entries: readonly AuditEntry[],
    at = clock.now(),
  ) {
    const json = (v: Record<string, unknown> | null | undefined) => (v ? JSON.stringify(v) : null);
    for (let i = 0; i < entries.length; i += APPEND_BATCH) {
      const batch = entries.slice(i, i + APPEND_BATCH);
      await plainSql(
        em,
        `insert into audit_events (actor_id, actor_email, action, entity_type, entity_id, lot_id,
           before, after, at) values ${batch.map(() => '(?, ?, ?, ?, ?, ?, ?, ?, ?)').join(', ')}`,
        batch.flatMap((e) => [
          actor?.id ?? null,
          actor?.email ?? 'system',
          e.action,
          e.entityType,
          e.entityId ?? null,
          e.lotId ?? null,
          json(e.before),
          json(e.after),
          at,
        ]),
        'run',
      );
    }
  }
}
