import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import type { RequestUser } from '../auth/request-user';
import { AuditEvent } from './entities/audit-event.entity';

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
      at: new Date(),
    });
    em.persist(event);
    return event;
  }
}
