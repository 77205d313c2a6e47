import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';

interface Job {
  work: (em: EntityManager) => Promise<unknown>;
  resolve: (value: unknown) => void;
  reject: (error: unknown) => void;
}

type Outcome = { ok: true; value: unknown } | { ok: false; error: unknown };

/** Most writes sharing one commit (our choice: bounds how long the last of them waits). */
export const MAX_GROUP = 64;

/**
 * Group commit. Writes that arrive while a commit is under way run together in the next
 * transaction, each in a savepoint of its own, and share its commit: one `fsync` under
 * `synchronous = FULL` for the group instead of one each (the commit was a quarter of a
 * reading's time on the bench set). A write that fails rolls back to its savepoint and its
 * caller gets its error; the others go on. Every caller is answered after the commit, so a
 * write reported done is as durable as with a transaction of its own. A lone write runs
 * without a savepoint.
 */
@Injectable()
export class GroupCommit {
  private readonly queue: Job[] = [];
  private running = false;

  constructor(private readonly em: EntityManager) {}

  run<T>(work: (em: EntityManager) => Promise<T>): Promise<T> {
    return new Promise<T>((resolve, reject) => {
      this.queue.push({ work, resolve: resolve as (value: unknown) => void, reject });
      if (this.running) return;
      this.running = true;
      // Started after the requests already read from the sockets have queued their writes:
      // with better-sqlite3 a transaction runs to its end without yielding to I/O, so a
      // group started at once would only ever hold one write.
      setImmediate(() => void this.drain());
    });
  }

  private async drain(): Promise<void> {
    try {
      while (this.queue.length > 0) await this.commit(this.queue.splice(0, MAX_GROUP));
    } finally {
      this.running = false;
    }
  }

  private async commit(group: Job[]): Promise<void> {
    const outcomes: Outcome[] = [];
    try {
      await this.em.fork().transactional(async (tx) => {
        if (group.length === 1) {
          outcomes.push({ ok: true, value: await group[0].work(tx) });
          return;
        }
        for (const job of group) {
          try {
            outcomes.push({ ok: true, value: await tx.transactional((inner) => job.work(inner)) });
          } catch (error) {
            outcomes.push({ ok: false, error });
          }
        }
      });
    } catch (error) {
      // The commit itself failed (or the lone write did): nothing of the group was written.
      for (const job of group) job.reject(error);
      return;
    }
    group.forEach((job, i) => {
      const outcome = outcomes[i];
      if (outcome.ok) job.resolve(outcome.value);
      else job.reject(outcome.error);
    });
  }
}
