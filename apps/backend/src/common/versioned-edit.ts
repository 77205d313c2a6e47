import { DomainError } from './domain-error';
import { EntityManager, OptimisticLockError } from '@mikro-orm/core';
import { EditVersion } from './dto-fields';

/**
 * The version an edit was made on (issue 17 item 7). Required: an edit that names no
 * version could silently overwrite one made since the client loaded the record.
 */
export class EditVersionDto {
  @EditVersion('The version of the record the edit was made on; a stale one gets 409')
  readonly version!: number;
}

/** A record an edit is checked against: its optimistic-lock version. */
export interface Versioned {
  version: number;
}

export interface VersionedEdit<E extends Versioned, V> {
  /** The version the client loaded. */
  version: number;
  /** Loads the record inside the edit's transaction (404 when it is not there). */
  load: (em: EntityManager) => Promise<E>;
  /** The record as the client shows it, sent back as `current` on a 409. */
  view: (em: EntityManager, record: E) => Promise<V> | V;
  /** How the 409's sentence names the record ("supplier NBCW"). */
  name: (record: E) => string;
  /** Makes the change (and its audit) on `record` through `em`; answers its new view. */
  change: (em: EntityManager, record: E) => Promise<V>;
}

/**
 * Runs one edit in a transaction on the version the client loaded. A stale version is
 * answered 409 with the record as it is now (`current`); of two edits made at once on one
 * version, the row is written `where version = ?` (MikroORM's optimistic lock), so one wins
 * and the other gets the same 409 — on SQLite the IMMEDIATE transaction already serialises
 * them and the second sees the new version. The version moves when the row is written: an
 * edit that changes only rows hanging off the record (a product's conductors) must touch
 * `updatedAt` so that it moves too.
 */
export async function versionedEdit<E extends Versioned, V>(
  em: EntityManager,
  edit: VersionedEdit<E, V>,
): Promise<V> {
  const stale = async (tx: EntityManager, record: E) =>
    new DomainError(
      'conflict',
      [
        {
          field: null,
          message: `Someone else saved ${edit.name(record)} after you opened it; your change was not saved. Reload it, then make your change again.`,
        },
      ],
      { current: await edit.view(tx, record) },
    );
  try {
    return await em.transactional(async (tx) => {
      const record = await edit.load(tx);
      if (record.version !== edit.version) throw await stale(tx, record);
      return edit.change(tx, record);
    });
  } catch (e) {
    if (!(e instanceof OptimisticLockError)) throw e;
    const fresh = em.fork();
    throw await stale(fresh, await edit.load(fresh));
  }
}
