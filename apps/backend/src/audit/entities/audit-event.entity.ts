import { Entity, Index, Property, type Opt } from '@mikro-orm/core';
import { clock } from '../../common/clock';
import { IdEntity } from '../../common/base-entities';

/** Append-only record of who did what to which record. No API deletes one. */
@Entity({ tableName: 'audit_events' })
@Index({ properties: ['entityType', 'entityId'] })
@Index({ properties: ['lotId', 'at'] })
export class AuditEvent extends IdEntity {
  /** Null for the system (seed, start-up). */
  @Property({ type: 'integer', nullable: true })
  actorId: number | null = null;

  @Property({ type: 'string', length: 254 })
  actorEmail!: string;

  /** e.g. lot.create, reading.void, decision.create, return.email */
  @Property({ type: 'string', length: 48 })
  @Index()
  action!: string;

  @Property({ type: 'string', length: 48 })
  entityType!: string;

  @Property({ type: 'integer', nullable: true })
  entityId: number | null = null;

  /** The lot the event belongs to, for the lot's timeline. */
  @Property({ type: 'integer', nullable: true })
  lotId: number | null = null;

  @Property({ type: 'json', nullable: true })
  before: Record<string, unknown> | null = null;

  @Property({ type: 'json', nullable: true })
  after: Record<string, unknown> | null = null;

  @Property({ type: 'Date' })
  @Index()
  at: Opt<Date> = clock.now();
}
