import { DomainError } from '../common/domain-error';
import type { EntityManager } from '@mikro-orm/core';
import { plainSql } from '../common/plain-sql';
import type { ClientKeyKind } from './entities/client-key.entity';
import { clock } from '../common/clock';

/**
 * The id of the record `clientId` made earlier, or null; 409 when it made another kind of
 * record. A request that fails (a racing twin's row refused ours by the primary key, or its
 * sample took the unit first) asks again here and answers with the twin's record.
 */
export async function earlierRecord(
  em: EntityManager,
  clientId: string,
  kind: ClientKeyKind,
): Promise<number | null> {
  const [row] = await plainSql<{ kind: string; recordId: number }[]>(
    em,
    'select kind, record_id as "recordId" from client_keys where client_id = ?',
    [clientId],
  );
  if (!row) return null;
  if (row.kind !== kind) {
    throw DomainError.conflict(
      `clientId ${clientId} was already used for a ${row.kind}; make a new id for a new ${kind}.`,
      'clientId',
    );
  }
  return Number(row.recordId);
}

/**
 * What `clientId` made earlier under `parent` (a reading on this sample, a sample in this
 * lot) as `load` gives it with its parent's id, or null; 409 when it made one under
 * another parent.
 */
export async function earlierRecordUnder<T>(
  em: EntityManager,
  clientId: string,
  kind: ClientKeyKind,
  parent: { kind: string; id: number },
  load: (id: number) => Promise<{ parentId: number; answer: T }>,
): Promise<T | null> {
  const id = await earlierRecord(em, clientId, kind);
  if (id === null) return null;
  const { parentId, answer } = await load(id);
  if (parentId !== parent.id) {
    throw DomainError.conflict(
      `clientId ${clientId} was already used for a ${kind} of ${parent.kind} ${parentId}; make a new id for a new ${kind}.`,
      'clientId',
    );
  }
  return answer;
}

/** Keeps the client's id with the record it made, in the caller's transaction. */
export async function keepClientKey(
  em: EntityManager,
  clientId: string,
  kind: ClientKeyKind,
  recordId: number,
  at: Date = clock.now(),
): Promise<void> {
  await plainSql(
    em,
    'insert into client_keys (client_id, kind, record_id, created_at) values (?, ?, ?, ?)',
    [clientId, kind, recordId, at],
    'run',
  );
}
