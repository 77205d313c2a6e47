import { Injectable, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import {
  EntityManager,
  type EntityName,
  type EventSubscriber,
  type FlushEventArgs,
} from '@mikro-orm/core';
import { onSqlWrite } from './sql-writes';

interface Entry<T> {
  value: T;
  generation: number;
  at: number;
}

/**
 * Results of expensive reads, kept until the next write that could change them. Any flush
 * through MikroORM that creates, changes or deletes one of the watched entities bumps the
 * generation and empties the cache, and so does a plain-SQL write announced through
 * `announceSqlWrite`.
 * A result computed while a write was flushed is stored under the old generation, so it is
 * never served; and no result is older than `maxAgeMs`, for writes made outside this
 * process.
 */
export class WriteInvalidatedCache<T> implements EventSubscriber {
  private generation = 0;
  private readonly entries = new Map<string, Entry<T>>();
  /** Computations under way, by key and generation: concurrent misses share one. */
  private readonly pending = new Map<string, Promise<T>>();
  private readonly names: ReadonlySet<string>;
  private unwatchSql: (() => void) | null = null;

  constructor(
    watched: readonly EntityName<object>[],
    private readonly maxAgeMs: number,
    private readonly maxEntries: number,
  ) {
    this.names = new Set(
      watched.map((e) => (typeof e === 'string' ? e : (e as { name: string }).name)),
    );
  }

  /** Starts watching the flushes of `em` and the SQL writes (once, when the module starts). */
  watch(em: EntityManager): void {
    em.getEventManager().registerSubscriber(this);
    this.unwatchSql = onSqlWrite((names) => {
      if (names.some((n) => this.names.has(n))) this.invalidate();
    });
  }

  /** Stops listening to SQL writes (when the module stops). */
  unwatch(): void {
    this.unwatchSql?.();
    this.unwatchSql = null;
  }

  afterFlush(args: FlushEventArgs): void {
    if (args.uow.getChangeSets().some((cs) => this.names.has(cs.name))) this.invalidate();
  }

  invalidate(): void {
    this.generation++;
    this.entries.clear();
    this.pending.clear();
  }

  /**
   * The cached value, or one computation of it shared by every caller that misses while it
   * runs (fifty lot lists arriving after a write count once, not fifty times).
   */
  async get(key: string, compute: () => Promise<T>): Promise<T> {
    const hit = this.entries.get(key);
    if (hit && hit.generation === this.generation && Date.now() - hit.at < this.maxAgeMs) {
      return hit.value;
    }
    const running = this.pending.get(key);
    if (running) return running;
    const generation = this.generation;
    const computation = compute().finally(() => {
      if (this.pending.get(key) === computation) this.pending.delete(key);
    });
    this.pending.set(key, computation);
    const value = await computation;
    if (generation === this.generation) {
      if (this.entries.size >= this.maxEntries) {
        this.entries.delete(this.entries.keys().next().value as string);
      }
      this.entries.set(key, { value, generation, at: Date.now() });
    }
    return value;
  }
}

/**
 * A Nest provider that holds caches: they watch the writes while its module runs. A
 * subclass lists its caches in `caches` and needs no constructor of its own.
 */
@Injectable()
export abstract class CacheProvider implements OnModuleInit, OnModuleDestroy {
  protected abstract readonly caches: readonly WriteInvalidatedCache<unknown>[];

  constructor(protected readonly em: EntityManager) {}

  onModuleInit() {
    for (const cache of this.caches) cache.watch(this.em);
  }

  onModuleDestroy() {
    for (const cache of this.caches) cache.unwatch();
  }
}
