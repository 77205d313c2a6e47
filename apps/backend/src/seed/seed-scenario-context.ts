import type { EntityManager } from '@mikro-orm/core';
import { AuditService, type AuditEntry } from '../audit/audit.service';
import type { AuditEvent } from '../audit/entities/audit-event.entity';
import type { RequestUser } from '../auth/request-user';
import { DecisionsService } from '../decisions/decisions.service';
import { InspectionStreams } from '../decisions/inspection-streams';
import { LotEvaluationService } from '../inspection/lot-evaluation';
import { ReadingWriter } from '../inspection/reading-writer';
import { SamplesService } from '../inspection/samples.service';
import { LotsService } from '../lots/lots.service';
import { LotListCache } from '../lots/lot-list-cache';
import { ChangeCounters } from '../database/change-counters';
import { PhotosService } from '../photos/photos.service';
import { ReturnsService } from '../returns/returns.service';
import type { StorageService } from '../storage/storage.service';
import { User } from '../users/entities/user.entity';
import type { DemoCatalog } from './seed-catalog';
import { SeedRandom } from './seed-scenario-random';
import { GroupCommit } from '../common/group-commit';

/** The story's own time: services stamp "now", the seed moves what they stamp to this. */
export class SeedClock {
  constructor(public now: Date) {}

  set(at: Date): Date {
    this.now = new Date(at);
    return this.now;
  }

  /** Moves on by some minutes. */
  advance(minutes: number): Date {
    return this.set(new Date(this.now.getTime() + minutes * 60_000));
  }
}

/** The real audit service, with each event dated at the story's clock. */
class ClockedAudit extends AuditService {
  constructor(private readonly clock: SeedClock) {
    super();
  }

  override record(em: EntityManager, actor: RequestUser | null, entry: AuditEntry): AuditEvent {
    const event = super.record(em, actor, entry);
    event.at = new Date(this.clock.now);
    return event;
  }
}

export type DemoRole = 'clerk' | 'qa' | 'buyer' | 'admin';

export interface ScenarioContext {
  em: EntityManager;
  now: Date;
  clock: SeedClock;
  rnd: SeedRandom;
  catalog: DemoCatalog;
  users: Record<DemoRole, RequestUser>;
  audit: AuditService;
  lots: LotsService;
  samples: SamplesService;
  writer: ReadingWriter;
  evaluations: LotEvaluationService;
  decisions: DecisionsService;
  photos: PhotosService;
  returns: ReturnsService;
}

/** The demo shop's currency (ISO 4217), invented for the story. */
export const DEMO_CURRENCY = 'EUR';

/** The real services, built on the seed's unit of work, with the story's clock on audit. */
export async function scenarioContext(
  em: EntityManager,
  storage: StorageService,
  catalog: DemoCatalog,
  now: Date,
): Promise<ScenarioContext> {
  const clock = new SeedClock(now);
  const audit = new ClockedAudit(clock);
  const evaluations = new LotEvaluationService(em);
  const users = {} as Record<DemoRole, RequestUser>;
  for (const role of ['clerk', 'qa', 'buyer', 'admin'] as const) {
    const u = await em.findOneOrFail(User, { email: `${role}@demo.example` });
    users[role] = { id: u.id, email: u.email, name: u.name, role: u.role };
  }
  return {
    em,
    now,
    clock,
    rnd: new SeedRandom(20260412),
    catalog,
    users,
    audit,
    lots: new LotsService(em, audit, new LotListCache(), new ChangeCounters(em)),
    samples: new SamplesService(em, audit),
    writer: new ReadingWriter(new GroupCommit(em), audit),
    evaluations,
    decisions: new DecisionsService(em, audit, evaluations, new InspectionStreams(audit)),
    photos: new PhotosService(em, audit, storage),
    returns: new ReturnsService(em, audit, { currency: DEMO_CURRENCY }),
  };
}
