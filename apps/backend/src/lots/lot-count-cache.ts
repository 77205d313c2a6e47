import { Injectable, type OnModuleInit } from '@nestjs/common';
import { EntityManager, type EventSubscriber } from '@mikro-orm/core';
import { Lot } from './entities/lot.entity';

/**
 * Safety net for lot writes made outside the ORM's unit of work (raw SQL, another
 * process): a cached total is never older than this (common practice, no source).
 */
const MAX_AGE_MS = 30_000;
/** Distinct filter sets remembered; the oldest is dropped beyond it (common practice, no source). */
const MAX_ENTRIES = 500;

interface Entry {
  total: number;
  generation: number;
  at: number;
}

/**
 * The lot list's total per filter set, kept until the next lot write. Counting every lot
 * of a status set with a text filter reads tens of thousands of rows, while the page
 * itself walks the received-at index and stops after 50: without this, the count is most
 * of a list request. Any created, changed or deleted Lot flushed through MikroORM bumps
 * the generation, which makes every cached total stale; a total read while a write was
 * being flushed is stored under the old generation, so it is never served.
 */
@Injectable()
export class LotCountCache implements OnModuleInit, EventSubscriber<Lot> {
  private generation = 0;
  private readonly entries = new Map<string, Entry>();

  constructor(private readonly em: EntityManager) {}

  onModuleInit() {
    this.em.getEventManager().registerSubscriber(this);
  }

  getSubscribedEntities() {
    return [Lot];
  }

  afterCreate() {
    this.invalidate();
  }

  afterUpdate() {
    this.invalidate();
  }

  afterDelete() {
    this.invalidate();
  }

  invalidate() {
    this.generation++;
    this.entries.clear();
  }

  async total(key: string, count: () => Promise<number>): Promise<number> {
    const hit = this.entries.get(key);
    if (hit && hit.generation === this.generation && Date.now() - hit.at < MAX_AGE_MS) {
      return hit.total;
    }
    const generation = this.generation;
    const total = await count();
    if (generation === this.generation) {
      if (this.entries.size >= MAX_ENTRIES) {
        this.entries.delete(this.entries.keys().next().value as string);
      }
      this.entries.set(key, { total, generation, at: Date.now() });
    }
    return total;
  }
}
