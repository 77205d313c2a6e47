import type { EntityManager } from '@mikro-orm/core';
import { describe, expect, it } from 'vitest';
import { announceSqlWrite } from './sql-writes';
import { WriteInvalidatedCache } from './write-invalidated-cache';

/** The part of MikroORM's EntityManager the cache uses, recording the subscriber. */
function fakeEm() {
  const subscribers: unknown[] = [];
  const em = {
    getEventManager: () => ({ registerSubscriber: (s: unknown) => subscribers.push(s) }),
  } as unknown as EntityManager;
  return { em, subscribers };
}

function counter(value = 1) {
  let calls = 0;
  let release: () => void = () => undefined;
  const gate = new Promise<void>((r) => (release = r));
  return {
    compute: async () => {
      calls++;
      await gate;
      return value;
    },
    release: () => release(),
    calls: () => calls,
  };
}

describe('WriteInvalidatedCache', () => {
  it('shares one computation between callers that miss at the same time, then serves it', async () => {
    const cache = new WriteInvalidatedCache<number>(['Lot'], 60_000, 10);
    const c = counter(7);
    const waiting = Promise.all([cache.get('k', c.compute), cache.get('k', c.compute)]);
    c.release();
    expect(await waiting).toEqual([7, 7]);
    expect(await cache.get('k', c.compute)).toBe(7);
    expect(c.calls()).toBe(1);
  });

  it('does not keep a value computed while a write happened, and recomputes after it', async () => {
    const cache = new WriteInvalidatedCache<number>(['Lot'], 60_000, 10);
    const first = counter(1);
    const during = cache.get('k', first.compute);
    cache.invalidate();
    first.release();
    expect(await during).toBe(1);
    const second = counter(2);
    second.release();
    expect(await cache.get('k', second.compute)).toBe(2);
    expect(second.calls()).toBe(1);
  });

  it('drops its values on a SQL write of a watched entity only, until unwatched', async () => {
    const { em, subscribers } = fakeEm();
    const cache = new WriteInvalidatedCache<number>(['Lot'], 60_000, 10);
    cache.watch(em);
    expect(subscribers).toEqual([cache]);
    const once = counter(1);
    once.release();
    await cache.get('k', once.compute);
    announceSqlWrite(['Photo']);
    await cache.get('k', once.compute);
    expect(once.calls()).toBe(1);
    announceSqlWrite(['Reading', 'Lot']);
    await cache.get('k', once.compute);
    expect(once.calls()).toBe(2);
    cache.unwatch();
    announceSqlWrite(['Lot']);
    await cache.get('k', once.compute);
    expect(once.calls()).toBe(2);
  });

  it('forgets a value older than its maximum age', async () => {
    const cache = new WriteInvalidatedCache<number>(['Lot'], 0, 10);
    const c = counter(3);
    c.release();
    await cache.get('k', c.compute);
    await new Promise((r) => setTimeout(r, 2));
    await cache.get('k', c.compute);
    expect(c.calls()).toBe(2);
  });
});
