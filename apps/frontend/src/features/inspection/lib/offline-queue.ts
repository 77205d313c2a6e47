import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { ReadingRequest } from '@/features/inspection/lib/reading-form';

/** Who took a queued reading: it is sent only while they are the one signed in. */
export interface Recorder {
  id: number;
  name: string;
}

/**
 * Readings a bench could not send yet, kept on the device in IndexedDB (through `idb`) and
 * sent in the order they were taken. Each carries the client ids of its reading and, while
 * the sample is not known, of its sample: the server answers a repeated id with what it
 * stored the first time, so a retry after a lost answer never records twice.
 */
export interface QueuedReading {
  /** The reading's client id (a UUID), also the entry's key. */
  clientId: string;
  lotId: number;
  conductorId: number;
  seq: number;
  sampleId: number | null;
  sampleClientId: string;
  request: ReadingRequest;
  /** "Unit 2 · Power 4 AWG", for the list. */
  label: string;
  queuedAt: number;
  /** The server refused it (not a network failure): kept, shown, not retried by itself. */
  refused: string | null;
  /**
   * The user signed in when it was taken. A reading goes to the server under the session's
   * user, so it waits while someone else is signed in on the device. Missing on readings
   * queued before the device kept it: those wait until someone says they took them.
   */
  recordedBy?: Recorder | null;
}

/** Taken by this user (and so theirs to send). */
export const isTakenBy = (entry: QueuedReading, userId: number) => entry.recordedBy?.id === userId;

interface QueueSchema extends DBSchema {
  readings: { key: string; value: QueuedReading; indexes: { byLot: number } };
}

let dbPromise: Promise<IDBPDatabase<QueueSchema>> | null = null;
const db = () =>
  (dbPromise ??= openDB<QueueSchema>('gaugeproof-bench', 1, {
    upgrade(database) {
      const store = database.createObjectStore('readings', { keyPath: 'clientId' });
      store.createIndex('byLot', 'lotId');
    },
  }));

export async function enqueue(entry: QueuedReading): Promise<void> {
  await (await db()).put('readings', entry);
}

/** The lot's waiting readings, oldest first. */
export async function queuedFor(lotId: number): Promise<QueuedReading[]> {
  const all = await (await db()).getAllFromIndex('readings', 'byLot', lotId);
  return all.sort((a, b) => a.queuedAt - b.queuedAt);
}

/** Every reading waiting on this device, any lot, oldest first. */
export async function allQueued(): Promise<QueuedReading[]> {
  const all = await (await db()).getAll('readings');
  return all.sort((a, b) => a.queuedAt - b.queuedAt);
}

export async function update(entry: QueuedReading): Promise<void> {
  await (await db()).put('readings', entry);
}

export async function remove(clientId: string): Promise<void> {
  await (await db()).delete('readings', clientId);
}

/**
 * A random (version 4) UUID. `crypto.randomUUID` exists only on HTTPS and localhost; a bench
 * on a plain-HTTP shop network still has `getRandomValues` (RFC 9562 section 5.4 layout).
 */
export function newClientId(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = (b[6]! & 0x0f) | 0x40;
  b[8] = (b[8]! & 0x3f) | 0x80;
  const hex = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
