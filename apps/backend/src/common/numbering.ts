import {
  UniqueConstraintViolationException,
  type EntityClass,
  type EntityManager,
  type FilterQuery,
  type QueryOrderMap,
} from '@mikro-orm/core';

/** `PREFIX-YYYY-NNNN`: sequential per year, four digits (more once past 9999). */
export function formatNumber(prefix: string, year: number, seq: number): string {
  return `${prefix}-${year}-${String(seq).padStart(4, '0')}`;
}

/**
 * The next sequence number of the year: one more than that of the newest record of the year
 * (records are numbered in the order they are created). Two writers can read the same one;
 * the unique constraint on the number then refuses one, and `retryOnUniqueConflict` runs its
 * unit of work again.
 */
export async function nextSeqInYear<T extends { id: number; number: string }>(
  em: EntityManager,
  entity: EntityClass<T>,
  prefix: string,
  year: number,
): Promise<number> {
  const where = { number: { $like: `${prefix}-${year}-%` } } as FilterQuery<T>;
  const last = await em.findOne(entity, where, { orderBy: { id: 'desc' } as QueryOrderMap<T> });
  return last ? Number(last.number.split('-')[2]) + 1 : 1;
}

/** Runs `work` again (a fresh transaction each time) when a unique constraint refuses it. */
export async function retryOnUniqueConflict<T>(work: () => Promise<T>, attempts = 5): Promise<T> {
  for (let i = 1; ; i++) {
    try {
      return await work();
    } catch (e) {
      if (!(e instanceof UniqueConstraintViolationException) || i >= attempts) throw e;
    }
  }
}
