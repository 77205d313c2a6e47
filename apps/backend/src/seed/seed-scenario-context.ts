import type { EntityManager } from '@mikro-orm/core';
import type { INestApplicationContext } from '@nestjs/common';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { Clock } from '../common/clock';
import { DecisionsService } from '../decisions/decisions.service';
import { LotEvaluationService } from '../inspection/lot-evaluation';
import { ReadingWriter } from '../inspection/reading-writer';
import { SamplesService } from '../inspection/samples.service';
import { LotsService } from '../lots/lots.service';
import { PhotosService } from '../photos/photos.service';
import { ReturnsService } from '../returns/returns.service';
import { User } from '../users/entities/user.entity';
import type { DemoCatalog } from './seed-catalog';
import { SeedRandom } from './seed-scenario-random';

/** Where the story stands: the moment its next step happens. */
export class StoryTime {
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

export type DemoRole = 'clerk' | 'qa' | 'buyer' | 'admin';

export interface ScenarioContext {
  em: EntityManager;
  now: Date;
  time: StoryTime;
  /**
   * Runs one step of the story at the story's time (`Clock.runAt`): whatever the services
   * stamp in it (audit events, created and updated times, a decision's, a return's steps)
   * is dated then, when it is written.
   */
  step<T>(fn: () => Promise<T>): Promise<T>;
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

/**
 * The application's own services, from Nest's container; inside the seed's transaction
 * their EntityManager is the seed's unit of work (MikroORM's transaction context).
 */
export async function scenarioContext(
  app: INestApplicationContext,
  em: EntityManager,
  catalog: DemoCatalog,
  now: Date,
): Promise<ScenarioContext> {
  const clock = app.get(Clock);
  const time = new StoryTime(now);
  const users = {} as Record<DemoRole, RequestUser>;
  for (const role of ['clerk', 'qa', 'buyer', 'admin'] as const) {
    const u = await em.findOneOrFail(User, { email: `${role}@demo.example` });
    users[role] = { id: u.id, email: u.email, name: u.name, role: u.role };
  }
  return {
    em,
    now,
    time,
    step: (fn) => clock.runAt(time.now, fn),
    rnd: new SeedRandom(20260412),
    catalog,
    users,
    audit: app.get(AuditService),
    lots: app.get(LotsService),
    samples: app.get(SamplesService),
    writer: app.get(ReadingWriter),
    evaluations: app.get(LotEvaluationService),
    decisions: app.get(DecisionsService),
    photos: app.get(PhotosService),
    returns: app.get(ReturnsService),
  };
}
