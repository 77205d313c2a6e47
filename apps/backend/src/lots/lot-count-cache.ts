import { Injectable, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { WriteInvalidatedCache } from '../common/write-invalidated-cache';
import { Lot } from './entities/lot.entity';

/**
 * Safety net for lot writes made outside this process: a cached total is never older than
 * this (common practice, no source).
 */
const MAX_AGE_MS = 30_000;
/** Distinct filter sets remembered; the oldest is dropped beyond it (common practice, no source). */
const MAX_ENTRIES = 500;

/**
 * The lot list's total per filter set, kept until the next lot write. Counting every lot
 * of a status set with a text filter reads tens of thousands of rows, while the page
 * itself walks the received-at index and stops after 50: without this, the count is most
 * of a list request. Lot writes through MikroORM clear it, and so does the reading writer's
 * SQL (announced as a write of `Lot`).
 */
@Injectable()
export class LotCountCache implements OnModuleInit, OnModuleDestroy {
  private readonly cache = new WriteInvalidatedCache<number>([Lot], MAX_AGE_MS, MAX_ENTRIES);

  constructor(private readonly em: EntityManager) {}

  onModuleInit() {
    this.cache.watch(this.em);
  }

  onModuleDestroy() {
    this.cache.unwatch();
  }

  total(key: string, count: () => Promise<number>): Promise<number> {
    return this.cache.get(key, count);
  }
}
