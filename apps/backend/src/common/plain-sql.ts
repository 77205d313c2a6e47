import type { EntityManager } from '@mikro-orm/core';
import type { Knex, SqlEntityManager } from '@mikro-orm/knex';

type Method = 'all' | 'run';

/** The driver's own reading of a raw result (rows, or affected rows and insert id). */
interface RawResultReader {
  transformRawResult<T>(res: unknown, method: Method): T;
}

/**
 * Runs one plain SQL statement with `?` placeholders and its values bound, in `em`'s
 * transaction when there is one, with the driver's errors converted as MikroORM converts
 * them (a unique violation stays a UniqueConstraintViolationException, answered 409).
 *
 * Not `em.execute`: that writes the values into the SQL text, so every call is a statement
 * SQLite has never seen and compiles again, and the connection's kept statements
 * (database/sqlite.config.ts) were pushed out by one-off texts. Measured on the bench set
 * with --cpu-prof: compiling took a seventh of a reading's time.
 */
export async function plainSql<T = Record<string, unknown>[]>(
  em: EntityManager,
  sql: string,
  params: readonly unknown[] = [],
  method: Method = 'all',
): Promise<T> {
  const sqlEm = em as SqlEntityManager;
  const connection = sqlEm.getConnection();
  const query = connection.getKnex().raw(sql, params as readonly Knex.RawBinding[]);
  const transaction = sqlEm.getTransactionContext<Knex.Transaction>();
  if (transaction) query.transacting(transaction);
  let res: unknown;
  try {
    res = await query;
  } catch (e) {
    throw sqlEm.getDriver().convertException(e as Error);
  }
  return (connection as unknown as RawResultReader).transformRawResult<T>(res, method);
}
