import { createReading } from '@/features/inspection/api/create-reading';
import { createSample } from '@/features/inspection/api/create-sample';
import {
  enqueue,
  newClientId,
  queuedFor,
  remove,
  update,
  type QueuedReading,
} from '@/features/inspection/lib/offline-queue';
import type { ReadingRequest } from '@/features/inspection/lib/reading-form';
import type { Reading } from '@/features/inspection/types';
import { isApiError } from '@/lib/api-client';

/** Which planned piece a bench reading is for; the sample is made on the first reading. */
export interface BenchPiece {
  lotId: number;
  conductorId: number;
  seq: number;
  /** The piece's sample when it already exists on the server. */
  sampleId?: number;
  /** "Unit 2 · Power 4 AWG". */
  label: string;
}

/** No answer at all (offline, connection dropped) or a gateway that could not reach us. */
export function isNetworkFailure(error: unknown): boolean {
  if (isApiError(error)) return [0, 502, 503, 504].includes(error.status);
  return error instanceof TypeError;
}

/** Sends one reading, cutting its sample first when needed; both carry their client ids. */
async function send(entry: QueuedReading): Promise<Reading> {
  if (entry.sampleId === null) {
    const sample = await createSample(entry.lotId, {
      conductorId: entry.conductorId,
      seq: entry.seq,
      clientId: entry.sampleClientId,
    });
    entry.sampleId = sample.id;
  }
  return createReading(entry.sampleId, { ...entry.request, clientId: entry.clientId });
}

const online = () => typeof navigator === 'undefined' || navigator.onLine !== false;

/**
 * Records a bench reading: sent at once when the network answers, else kept on the device
 * and null returned. Readings already waiting go first, so the order is kept.
 */
export async function recordBenchReading(
  piece: BenchPiece,
  request: ReadingRequest,
): Promise<Reading | null> {
  const waiting = await queuedFor(piece.lotId);
  const samePiece = waiting.find((q) => q.conductorId === piece.conductorId && q.seq === piece.seq);
  const entry: QueuedReading = {
    clientId: newClientId(),
    lotId: piece.lotId,
    conductorId: piece.conductorId,
    seq: piece.seq,
    sampleId: piece.sampleId ?? samePiece?.sampleId ?? null,
    // A second reading of a piece whose sample is still waiting names the same sample.
    sampleClientId: samePiece?.sampleClientId ?? newClientId(),
    request,
    label: piece.label,
    queuedAt: Date.now(),
    refused: null,
  };
  if (!online() || waiting.some((q) => q.refused === null)) {
    await enqueue(entry);
    void flushQueue(piece.lotId);
    return null;
  }
  try {
    return await send(entry);
  } catch (error) {
    if (!isNetworkFailure(error)) throw error;
    await enqueue(entry);
    return null;
  }
}

export interface FlushResult {
  sent: number;
  /** Still waiting for the network. */
  waiting: number;
}

let flushing: Promise<FlushResult> | null = null;

/**
 * Sends the lot's waiting readings in the order they were taken, one at a time; stops at the
 * first network failure. A reading the server refuses stays on the device, marked with the
 * server's reason, and the next ones go on.
 */
export function flushQueue(lotId: number): Promise<FlushResult> {
  flushing ??= (async () => {
    let sent = 0;
    try {
      const entries = (await queuedFor(lotId)).filter((q) => q.refused === null);
      for (const [i, entry] of entries.entries()) {
        try {
          await send(entry);
          await remove(entry.clientId);
          sent += 1;
        } catch (error) {
          if (isNetworkFailure(error)) return { sent, waiting: entries.length - i };
          await update({
            ...entry,
            refused: error instanceof Error ? error.message : String(error),
          });
        }
      }
      return { sent, waiting: 0 };
    } finally {
      flushing = null;
    }
  })();
  return flushing;
}
